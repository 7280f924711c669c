import { gridSeasons } from './hour-grid';
import type { EnergyCharge, TariffInput } from './tariff.schema';
import type { UrdbRate } from './urdb.schema';

/** Something of a URDB rate Runrate did not take as it stands, named by its field. */
export interface ImportNote {
	code: string;
	field: string;
	message: string;
}

export interface UrdbImport {
	/** Null when the rate's energy cannot be expressed: never priced wrongly. */
	tariff: TariffInput | null;
	meta: {
		utility: string | null;
		name: string | null;
		sector: string | null;
		label: string | null;
		source: string | null;
	};
	notes: ImportNote[];
}

type Tier = NonNullable<UrdbRate['energyratestructure']>[number][number];

/** URDB's price per kWh: `rate + adj` (the adjustment is added, never multiplied; NREL's parsers). */
const price = (tier: Tier) => (tier.rate ?? 0) + (tier.adj ?? 0);

/** Fields of demand, export and free text that this import does not read yet, in the notes by name. */
const UNREAD = [
	'flatdemandstructure',
	'demandratestructure',
	'demandratchetpercentage',
	'coincidentratestructure',
	'demandreactivepowercharge',
	'dgrules',
	'energyattrs',
	'demandattrs',
	'fixedattrs'
];

/** One period's tiers as Runrate tiers (cumulative bounds, the last unbounded), or why not. */
function periodTiers(tiers: Tier[], notes: ImportNote[], field: string) {
	if (tiers.some((t) => t.unit && t.unit !== 'kWh')) {
		notes.push({
			code: 'tier-unit',
			field,
			message: `Tiers in "${tiers.find((t) => t.unit !== 'kWh')?.unit}" are not imported yet`
		});
		return null;
	}
	if (tiers.at(-1)?.max !== undefined)
		notes.push({
			code: 'last-tier-bounded',
			field,
			message:
				"The last tier has a bound; use above it is charged at the last tier's price, as NREL's engines do"
		});
	return tiers.map((t, i) => ({
		uptoKwh: i === tiers.length - 1 ? null : (t.max ?? null),
		perKwh: price(t)
	}));
}

/** The rate's energy charge: flat, tiered, or time-of-use through its 12 × 24 schedules. */
function energyCharge(rate: UrdbRate, notes: ImportNote[]): EnergyCharge | null | undefined {
	const periods = rate.energyratestructure;
	if (!periods) return undefined;
	const field = 'energyratestructure';
	if (periods.some((tiers) => tiers.some((t) => price(t) < 0))) {
		notes.push({
			code: 'negative-price',
			field,
			message: 'A period has a negative price per kWh (rate + adj)'
		});
		return null;
	}
	if (periods.length === 1) {
		const tiers = periodTiers(periods[0]!, notes, field);
		if (!tiers) return null;
		return tiers.length === 1
			? { label: 'Energy', type: 'flat', perKwh: tiers[0]!.perKwh }
			: { label: 'Energy', type: 'tiered', tiers };
	}
	if (periods.some((tiers) => tiers.length > 1)) {
		notes.push({
			code: 'tiers-in-tou',
			field,
			message: 'Tiers inside time-of-use periods are not imported yet'
		});
		return null;
	}
	const seasons = gridSeasons(rate.energyweekdayschedule!, rate.energyweekendschedule!);
	return {
		label: 'Energy',
		type: 'tou',
		seasons: seasons.map((season) => ({
			months: season.months,
			otherPerKwh: price(periods[season.otherIndex]![0]!),
			periods: season.periods.map((p) => ({
				label: `Period ${p.index + 1}`,
				perKwh: price(periods[p.index]![0]!),
				days: p.days,
				windows: p.windows
			}))
		}))
	};
}

/**
 * A URDB rate as a Runrate tariff, with notes on what was not taken. Holidays are priced as the
 * weekdays they fall on, as the database's schedules and NREL's engines have no holidays.
 */
export function tariffFromUrdb(rate: UrdbRate): UrdbImport {
	const notes: ImportNote[] = [];
	const energy = energyCharge(rate, notes);
	const monthly = rate.fixedchargefirstmeter ?? rate.fixedmonthlycharge;
	const units = rate.fixedchargeunits ?? '$/month';
	const fixedCharges =
		monthly === undefined || monthly === 0
			? []
			: units === '$/day'
				? [{ label: 'Fixed charge', perDay: monthly }]
				: [{ label: 'Fixed charge', perMonth: monthly }];
	if (monthly && units !== '$/month' && units !== '$/day')
		notes.push({
			code: 'fixed-unit',
			field: 'fixedchargeunits',
			message: `Fixed charges in "${units}" are not imported yet`
		});
	if (rate.annualmincharge)
		notes.push({
			code: 'annual-minimum',
			field: 'annualmincharge',
			message: 'A yearly minimum charge is not imported yet'
		});
	const unread = UNREAD.filter((key) => (rate as Record<string, unknown>)[key] !== undefined);
	for (const field of unread)
		notes.push({ code: 'not-read', field, message: `${field} is not imported yet` });
	const demandUnread = unread.some((f) => f.includes('demand'));
	return {
		tariff:
			energy === null || demandUnread
				? null
				: {
						currency: 'USD',
						holidaysAsWeekends: false,
						fixedCharges,
						energyCharges: energy ? [energy] : [],
						minimumMonthly: rate.minmonthlycharge ?? null
					},
		meta: {
			utility: rate.utility ?? null,
			name: rate.name ?? null,
			sector: rate.sector ?? null,
			label: rate.label ?? null,
			source: rate.source ?? rate.uri ?? null
		},
		notes
	};
}
