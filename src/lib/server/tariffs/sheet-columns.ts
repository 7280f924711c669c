import type { Bounds } from '$lib/calc';
import { CUSTOMER_CLASSES } from '$lib/forms/tariff-meta.schema';

/** The columns of the tariff batch import sheet: one row per version of a flat or tiered tariff. */
export interface TariffSheetColumn {
	name: string;
	/** The header must have the column; a required cell may still be refused when empty. */
	required: boolean;
	meaning: string;
}

export const MAX_SHEET_ROWS = 2000;
export const MAX_TIERS = 5;

const column = (name: string, meaning: string, required = false): TariffSheetColumn => ({
	name,
	required,
	meaning
});
const tierColumns = Array.from({ length: MAX_TIERS }, (_, i) => [
	column(
		`tier${i + 1}_upto_kwh`,
		`Tier ${i + 1} ends at this many kWh a month; empty on the last tier ("and above").`
	),
	column(`tier${i + 1}_per_kwh`, `Rate per kWh within tier ${i + 1}. Fill tiers in order from tier 1.`)
]).flat();

export const TARIFF_SHEET_COLUMNS: readonly TariffSheetColumn[] = [
	column('utility', 'The utility that bills the tariff.', true),
	column('name', 'The tariff’s name, as the utility writes it.', true),
	column('code', 'The utility’s tariff code, such as R-1.'),
	column('country', 'Two-letter country code, such as US.', true),
	column('region', 'State or province code, such as WI.'),
	column('area', 'Free-text area within the region.'),
	column('customer_class', `One of: ${CUSTOMER_CLASSES.join(', ')}.`, true),
	column('currency', 'Three-letter currency code, such as USD.', true),
	column('timezone', 'IANA time zone, such as America/Chicago.', true),
	column('holiday_country', 'Country whose public holidays apply; empty for none.'),
	column('holiday_region', 'State or province whose public holidays apply (with holiday_country).'),
	column('description', 'Free text shown on the tariff page.'),
	column('effective_from', 'First day this version applies, as 2027-01-01.', true),
	column('effective_to', 'Last day it applies; empty while it is in force.'),
	column('source', 'Where the figures come from: a web address or a document name.', true),
	column('checked_on', 'When someone last checked the figures against the source, as 2027-01-01.', true),
	column('change_note', 'What changed from the previous version.'),
	column('customer_charge_per_month', 'Fixed customer charge per billing month.'),
	column('customer_charge_per_day', 'Fixed customer charge per day of the billing period.'),
	column('energy_per_kwh', 'Flat energy rate per kWh. Give this or the tiers, not both.'),
	...tierColumns,
	column('rider_label', 'Name of a per-kWh rider, such as Fuel cost adjustment.'),
	column('rider_per_kwh', 'Rider per kWh; below zero for a credit.'),
	column('tax_label', 'Name of a percentage tax, such as Sales tax.'),
	column('tax_percent', 'Tax as a percent of the bill before tax.'),
	column('minimum_monthly', 'Minimum bill per month before tax.')
];

export const NUMBERS: Record<string, { label: string; bounds: Bounds }> = {
	customer_charge_per_month: { label: 'Customer charge per month', bounds: { min: 0 } },
	customer_charge_per_day: { label: 'Customer charge per day', bounds: { min: 0 } },
	energy_per_kwh: { label: 'Energy per kWh', bounds: { min: 0 } },
	rider_per_kwh: { label: 'Rider per kWh', bounds: {} },
	tax_percent: { label: 'Tax percent', bounds: { min: 0 } },
	minimum_monthly: { label: 'Minimum monthly', bounds: { min: 0 } }
};
for (let n = 1; n <= MAX_TIERS; n++) {
	NUMBERS[`tier${n}_upto_kwh`] = { label: `Tier ${n} up to kWh`, bounds: { above: 0 } };
	NUMBERS[`tier${n}_per_kwh`] = { label: `Tier ${n} per kWh`, bounds: { min: 0 } };
}
