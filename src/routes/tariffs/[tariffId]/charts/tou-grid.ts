import { daysMatch, INTERVAL_MINUTES, slotMask, SLOTS_PER_DAY, type TariffInput } from '$lib/calc';

/**
 * The data of the time-of-use chart: for each season of each time-of-use charge, what every quarter
 * hour of a weekday and of a weekend day costs. It reads the periods as the calculation does (first
 * matching period wins, the season's other rate elsewhere; a window ending before it starts covers
 * both ends of the same day), by the core's own clock helpers, so the chart and the bill agree.
 */

type EnergyInput = NonNullable<TariffInput['energyCharges']>[number];
type SeasonInput = Extract<EnergyInput, { type: 'tou' }>['seasons'][number];

export type DayType = 'weekday' | 'weekend';
export const DAY_TYPES: readonly DayType[] = ['weekday', 'weekend'];

/** The label of the season's rate outside its periods. */
export const OTHER_TIMES = 'Other times';

/** What a quarter hour costs: a period's label and rate, or the other rate (`period` null). */
export interface SlotPrice {
	label: string;
	perKwh: number;
	/** Index of the period in its season, null for the other rate. */
	period: number | null;
}

export interface DayRow {
	dayType: DayType;
	/** 96 quarter hours: 0 is 00:00–00:15, 95 is 23:45–24:00. */
	slots: SlotPrice[];
}

export interface SeasonGrid {
	months: number[];
	rows: DayRow[];
}

export interface TouGrid {
	label: string;
	seasons: SeasonGrid[];
}

/** Consecutive quarter hours of a row at the same price, in hours of the day (0–24). */
export interface PriceRun extends SlotPrice {
	dayType: DayType;
	startHour: number;
	endHour: number;
}

/** A season's two rows. A period without windows (an unfinished draft) covers nothing. */
export function seasonGrid(season: SeasonInput): SeasonGrid {
	const masks = season.periods.map((period) =>
		period.windows.length === 0 ? new Uint8Array(SLOTS_PER_DAY) : slotMask(period.windows)
	);
	const other: SlotPrice = { label: OTHER_TIMES, perKwh: season.otherPerKwh, period: null };
	const rows = DAY_TYPES.map((dayType) => ({
		dayType,
		slots: Array.from({ length: SLOTS_PER_DAY }, (_, slot): SlotPrice => {
			const index = season.periods.findIndex(
				(period, p) => daysMatch(period.days ?? 'all', dayType === 'weekend') && masks[p]?.[slot] === 1
			);
			const period = season.periods[index];
			return period ? { label: period.label, perKwh: period.perKwh, period: index } : other;
		})
	}));
	return { months: [...season.months], rows };
}

/** One grid per time-of-use energy charge, in the tariff's order; none when it has no such charge. */
export function touGrids(tariff: TariffInput): TouGrid[] {
	return (tariff.energyCharges ?? []).flatMap((charge) =>
		charge.type === 'tou' ? [{ label: charge.label, seasons: charge.seasons.map(seasonGrid) }] : []
	);
}

/** A row's quarter hours merged into runs of the same price: 00:00–07:00, 07:00–16:00, … */
export function priceRuns(row: DayRow): PriceRun[] {
	const runs: PriceRun[] = [];
	const hours = (slot: number) => (slot * INTERVAL_MINUTES) / 60;
	row.slots.forEach((price, slot) => {
		const last = runs[runs.length - 1];
		if (last && last.period === price.period && last.perKwh === price.perKwh) last.endHour = hours(slot + 1);
		else runs.push({ ...price, dayType: row.dayType, startHour: hours(slot), endHour: hours(slot + 1) });
	});
	return runs;
}

/** The prices a season actually shows, dearest first (the chart's legend). */
export function seasonPrices(season: SeasonGrid): SlotPrice[] {
	const seen = new Map<string, SlotPrice>();
	for (const row of season.rows) {
		for (const price of row.slots) seen.set(`${price.period}|${price.perKwh}`, price);
	}
	return [...seen.values()].sort((a, b) => b.perKwh - a.perKwh || (a.period ?? -1) - (b.period ?? -1));
}

/** The cheapest and dearest rate shown across the grids, so every season shares one colour scale. */
export function rateRange(grids: readonly TouGrid[]): [number, number] {
	const rates = grids.flatMap((grid) =>
		grid.seasons.flatMap((season) => seasonPrices(season).map((price) => price.perKwh))
	);
	if (rates.length === 0) return [0, 0];
	return [Math.min(...rates), Math.max(...rates)];
}
