import Papa from 'papaparse';
import { TARIFF_SHEET_COLUMNS } from './sheet-columns';

const TEMPLATE_ROWS: Record<string, string>[] = [
	{
		utility: 'Demo Valley Power Cooperative (invented)',
		name: 'Residential service',
		code: 'DV-R1',
		country: 'US',
		region: 'ID',
		customer_class: 'residential',
		currency: 'USD',
		timezone: 'America/Boise',
		holiday_country: 'US',
		holiday_region: 'ID',
		description: 'Invented example: a flat tariff',
		effective_from: '2027-01-01',
		source: 'Invented for the template',
		checked_on: '2026-11-20',
		customer_charge_per_month: '15.50',
		energy_per_kwh: '0.124',
		rider_label: 'Power cost adjustment',
		rider_per_kwh: '0.011',
		tax_label: 'Franchise tax',
		tax_percent: '3'
	},
	{
		utility: 'Northmere Electric (invented)',
		name: 'Residential inclining block',
		code: 'NM-R2',
		country: 'US',
		region: 'WI',
		customer_class: 'residential',
		currency: 'USD',
		timezone: 'America/Chicago',
		holiday_country: 'US',
		holiday_region: 'WI',
		description: 'Invented example: three inclining tiers and a minimum bill',
		effective_from: '2027-01-01',
		source: 'Invented for the template',
		checked_on: '2026-11-20',
		change_note: 'Second tier now ends at 1000 kWh',
		customer_charge_per_day: '0.40',
		tier1_upto_kwh: '500',
		tier1_per_kwh: '0.098',
		tier2_upto_kwh: '1000',
		tier2_per_kwh: '0.128',
		tier3_per_kwh: '0.162',
		minimum_monthly: '18'
	}
];

/** A CSV with every column of the format and two invented example rows (one flat, one tiered). */
export function tariffSheetTemplateCsv(): string {
	const fields = TARIFF_SHEET_COLUMNS.map((c) => c.name);
	return `${Papa.unparse({ fields, data: TEMPLATE_ROWS.map((row) => fields.map((name) => row[name] ?? '')) })}\r\n`;
}
