import type { EnergyCharge } from './tariff.schema';
import { type ExportNote, type Grid, IndexBook, filledGrid, gridsOf, windowHours } from './urdb-export-grid';

type UrdbTierOut = { rate: number; max?: number; unit: string };

/** Prices tier by tier with their cumulative limits as URDB tiers (the last unbounded). */
const tiersOf = (prices: readonly number[], limits: readonly number[], unit: string): UrdbTierOut[] =>
	prices.map((rate, i) => (i < limits.length ? { rate, max: limits[i]!, unit } : { rate, unit }));

/**
 * A Runrate energy charge in the open rate database's shape: one period (flat or tiered) or a 12 × 24
 * pair of schedules over periods of tiers. Each season's periods and its "other" hours become period
 * indexes (an imported "Period N" goes back to index N − 1); windows are written hour by hour.
 */
export function energyFields(charge: EnergyCharge, notes: ExportNote[]): Record<string, unknown> {
	const unit = charge.type !== 'flat' && charge.tiersPer === 'day' ? 'kWh daily' : 'kWh';
	if (charge.months)
		notes.push({
			field: 'energyCharges',
			message: `"${charge.label}" applies only in some months; it was written for every month`
		});
	if (charge.type !== 'tou') {
		const structure =
			charge.type === 'flat'
				? [[{ rate: charge.perKwh, unit }]]
				: [
						tiersOf(
							charge.tiers.map((t) => t.perKwh),
							charge.tiers.slice(0, -1).map((t) => t.uptoKwh ?? 0),
							unit
						)
					];
		return {
			energyratestructure: structure,
			energyweekdayschedule: filledGrid(0),
			energyweekendschedule: filledGrid(0)
		};
	}
	const book = new IndexBook(/^Period (\d+)$/);
	book.reserve(charge.seasons.flatMap((s) => s.periods.map((p) => p.label)));
	const grids: [Grid, Grid] = [filledGrid(-1), filledGrid(-1)];
	let rounded = false;
	for (const season of charge.seasons) {
		const limits = season.tierLimitsKwh ?? [];
		const key = (first: number, above: readonly number[] | undefined) =>
			JSON.stringify({ prices: [first, ...(above ?? [])], limits });
		// One index per label and price in a season: an imported period split by day type goes back whole.
		const used = new Map<string, number>();
		const slots = season.periods.map((p) => {
			const slot = `${p.label}|${key(p.perKwh, p.abovePerKwh)}`;
			const index =
				used.get(slot) ?? book.index(key(p.perKwh, p.abovePerKwh), p.label, new Set(used.values()));
			used.set(slot, index);
			return { period: p, index };
		});
		const other = book.index(key(season.otherPerKwh, season.otherAbovePerKwh), null, new Set(used.values()));
		for (const month of season.months) {
			for (const g of [0, 1]) grids[g]![month - 1]!.fill(other);
			// Later periods first, so the first window holding an hour wins, as the core prices.
			for (const { period, index } of [...slots].reverse()) {
				const { hours, whole } = windowHours(period.windows);
				rounded ||= !whole;
				for (const g of gridsOf(period.days)) for (const hour of hours) grids[g]![month - 1]![hour] = index;
			}
		}
	}
	if (grids.some((grid) => grid.some((row) => row.includes(-1)))) {
		const none = book.index(JSON.stringify({ prices: [0], limits: [] }), null);
		for (const grid of grids) for (const row of grid) row.forEach((v, h) => v === -1 && (row[h] = none));
	}
	if (rounded)
		notes.push({
			field: 'energyCharges',
			message:
				'Windows that start or end between whole hours were written to whole hours (each hour by its first quarter)'
		});
	const structure = book.structure(
		(k) => {
			const { prices, limits } = JSON.parse(k) as { prices: number[]; limits: number[] };
			return tiersOf(prices, limits, unit);
		},
		[{ rate: 0, unit }]
	);
	return { energyratestructure: structure, energyweekdayschedule: grids[0], energyweekendschedule: grids[1] };
}
