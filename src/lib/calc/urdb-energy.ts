import { gridSeasons } from './hour-grid';
import type { EnergyCharge } from './tariff.schema';
import type { UrdbRate } from './urdb.schema';

/** Something of a URDB rate Runrate did not take as it stands, named by its field. */
export interface ImportNote {
	code: string;
	field: string;
	message: string;
}

/** One tier of a URDB period: `rate`, `adj`, `max` (cumulative), `unit`. */
export type UrdbTier = NonNullable<UrdbRate['energyratestructure']>[number][number];

/** URDB's price per unit: `rate + adj` (the adjustment is added, never multiplied; NREL's parsers). */
export const price = (tier: UrdbTier) => (tier.rate ?? 0) + (tier.adj ?? 0);

/** A period's cumulative tier bounds (all but the last tier's `max`), noting a bounded last tier. */
export function tierLimits(tiers: UrdbTier[], notes: ImportNote[], field: string): number[] {
	if (
		tiers.length > 1 &&
		tiers.at(-1)?.max !== undefined &&
		!notes.some((n) => n.code === 'last-tier-bounded')
	)
		notes.push({
			code: 'last-tier-bounded',
			field,
			message:
				"The last tier has a bound; use above it is charged at the last tier's price, as NREL's engines do"
		});
	return tiers.slice(0, -1).map((t) => t.max ?? Number.POSITIVE_INFINITY);
}

/**
 * Whether the tiers count kWh per billing period ("kWh") or per day ("kWh daily": bounds × the days
 * billed), or cannot be read: other units (kWh/kW, …) and a mix of units are refused with a note.
 */
function tiersPer(periods: UrdbTier[][], notes: ImportNote[]): 'period' | 'day' | null {
	const units = new Set(periods.flatMap((tiers) => tiers.map((t) => t.unit ?? 'kWh')));
	const other = [...units].find((u) => u !== 'kWh' && u !== 'kWh daily');
	if (other !== undefined) {
		notes.push({
			code: 'tier-unit',
			field: 'energyratestructure',
			message: `Tiers counted in "${other}" cannot be priced by Runrate; the rate was not imported`
		});
		return null;
	}
	if (units.size > 1) {
		notes.push({
			code: 'mixed-units',
			field: 'energyratestructure',
			message: 'Some tiers count kWh per month and others per day; the rate was not imported'
		});
		return null;
	}
	return units.has('kWh daily') ? 'day' : 'period';
}

/** Prices of one period tier by tier, stretched to `count` tiers (a single-tier period repeats its price). */
function pricesOf(tiers: UrdbTier[], count: number): number[] {
	return Array.from({ length: count + 1 }, (_, i) => price(tiers[Math.min(i, tiers.length - 1)]!));
}

/**
 * The rate's energy charge: flat, tiered, or time-of-use through its 12 × 24 schedules, with tiers
 * inside the periods. Runrate applies a season's tier limits to the kWh of all its periods together, so
 * the periods a season uses must share their limits; a period of one tier shares any limits (its price
 * holds in every tier). Limits that differ within a season are refused with a note.
 */
export function energyCharge(rate: UrdbRate, notes: ImportNote[]): EnergyCharge | null | undefined {
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
	const per = tiersPer(periods, notes);
	if (per === null) return null;
	const perField = per === 'day' ? { tiersPer: 'day' as const } : {};
	if (periods.length === 1) {
		const tiers = periods[0]!;
		const limits = tierLimits(tiers, notes, field);
		if (tiers.length === 1) return { label: 'Energy', type: 'flat', perKwh: price(tiers[0]!) };
		return {
			label: 'Energy',
			type: 'tiered',
			...perField,
			tiers: tiers.map((t, i) => ({ uptoKwh: limits[i] ?? null, perKwh: price(t) }))
		};
	}
	const seasons = gridSeasons(rate.energyweekdayschedule!, rate.energyweekendschedule!);
	const out = [];
	for (const season of seasons) {
		const used = [season.otherIndex, ...season.periods.map((p) => p.index)];
		const limitSets = used
			.map((index) => tierLimits(periods[index]!, notes, field))
			.filter((limits) => limits.length > 0);
		const limits = limitSets[0] ?? [];
		if (limitSets.some((l) => l.join() !== limits.join()) || limits.includes(Number.POSITIVE_INFINITY)) {
			notes.push({
				code: 'tier-limits-differ',
				field,
				message: `The periods of months ${season.months.join(', ')} have different tier limits; Runrate needs one set of limits per season, so the rate was not imported`
			});
			return null;
		}
		const priced = (index: number) => {
			const [first, ...above] = pricesOf(periods[index]!, limits.length);
			return { perKwh: first!, above };
		};
		const other = priced(season.otherIndex);
		out.push({
			months: season.months,
			otherPerKwh: other.perKwh,
			...(limits.length > 0 ? { otherAbovePerKwh: other.above, tierLimitsKwh: limits } : {}),
			periods: season.periods.map((p) => {
				const own = priced(p.index);
				return {
					label: `Period ${p.index + 1}`,
					perKwh: own.perKwh,
					...(limits.length > 0 ? { abovePerKwh: own.above } : {}),
					days: p.days,
					windows: p.windows
				};
			})
		});
	}
	return { label: 'Energy', type: 'tou', ...perField, seasons: out };
}
