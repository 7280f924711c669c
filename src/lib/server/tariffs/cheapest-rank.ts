// Prices one metered year on each candidate tariff and ranks them by annual cost (no database here).
import {
	calculate,
	calculateAcrossVersions,
	calculateRequestSchema,
	holidaysSchema,
	NoVersionInForce,
	parseRequest,
	type CalculateRequest,
	type DatedTariff,
	type EquipmentInput,
	type Meter,
	type VersionedResponse
} from '$lib/calc';
import type { RankedTariff, UnpricedTariff, UsageMonth } from '$lib/cheapest/types';
import { touShares, type TouShare } from './cheapest-shares';

/** A tariff the site may use, with every version, ready to price. */
export type Candidate = {
	id: string;
	name: string;
	utility: string;
	currency: string;
	/** The tariff's own holiday rule; null: the site's country and region. */
	holidays: unknown;
	versions: DatedTariff[];
};

export type { RankedTariff, UnpricedTariff, UsageMonth } from '$lib/cheapest/types';

export type Ranking = {
	ranked: RankedTariff[];
	unpriced: UnpricedTariff[];
	/** The top tariff's share of the year's kWh in each time-of-use period (empty when it has none). */
	topShares: TouShare[];
	/** The load priced, month by month (the same on every tariff); empty when the year cannot be priced. */
	usage: UsageMonth[];
};

/** The year to price: a meter's readings, or a scenario's equipment (its estimated load), or both. */
export type YearContext = {
	meter?: Meter;
	equipment?: EquipmentInput[];
	/** 'YYYY-MM', the first of the 12 months priced. */
	firstMonth: string;
	timezone: string;
	siteHolidays: { country: string; region?: string };
	currency: string;
	currentTariffId: string | null;
};

const sumKind = (result: VersionedResponse, kind: string) =>
	result.periods.reduce(
		(sum, p) => sum + p.charges.filter((c) => c.kind === kind).reduce((s, c) => s + c.amount, 0),
		0
	);

const cents = (amount: number) => Math.round(amount * 100) / 100;

/**
 * The year's request without a tariff, checked once: the meter's 35,040 values are validated a single
 * time, then each tariff swaps in its versions (and its holidays, when it names its own).
 */
function baseRequest(year: YearContext): CalculateRequest | string {
	const parsed = parseRequest(calculateRequestSchema, {
		period: { start: year.firstMonth, months: 12 },
		timezone: year.timezone,
		holidays: year.siteHolidays,
		tariff: { currency: year.currency },
		equipment: year.equipment ?? [],
		...(year.meter ? { meter: year.meter } : {})
	});
	return parsed.success ? parsed.data : (parsed.error.issues[0]?.message ?? 'This usage cannot be priced.');
}

/**
 * Prices the year on every candidate in the site's currency (others are listed, not priced) and ranks
 * them cheapest first. A tariff with no version in force on some billing period's first day is "not in
 * force for the whole year" (`beforeFirst: 'refuse'`), never priced on rates from outside its dates.
 */
export function rankTariffs(candidates: readonly Candidate[], year: YearContext): Ranking {
	const base = baseRequest(year);
	const ranked: RankedTariff[] = [];
	const unpriced: UnpricedTariff[] = [];
	const results = new Map<string, VersionedResponse>();
	for (const c of candidates) {
		const who = { id: c.id, name: c.name, utility: c.utility, current: c.id === year.currentTariffId };
		if (typeof base === 'string') {
			unpriced.push({ ...who, reason: base });
			continue;
		}
		if (c.currency !== year.currency) {
			unpriced.push({ ...who, reason: `Priced in ${c.currency}; this site pays in ${year.currency}.` });
			continue;
		}
		const holidays = c.holidays ? holidaysSchema.safeParse(c.holidays) : null;
		if (holidays && !holidays.success) {
			unpriced.push({ ...who, reason: 'Its holiday calendar is not one Runrate knows.' });
			continue;
		}
		try {
			const request = { ...base, holidays: holidays ? holidays.data : base.holidays };
			const result = calculateAcrossVersions(request, c.versions, 'refuse');
			results.set(c.id, result);
			ranked.push({
				...who,
				annualCost: result.totals.cost,
				energyCost: cents(sumKind(result, 'energy')),
				fixedCost: cents(sumKind(result, 'fixed')),
				demandCost: cents(sumKind(result, 'demand')),
				differenceToCurrent: null,
				versionNumbers: [...new Set(result.versions.map((v) => v.number))],
				monthlyCosts: result.periods.map((p) => p.total)
			});
		} catch (error) {
			const reason =
				error instanceof NoVersionInForce
					? `Not in force for the whole year: no version covers ${error.date}.`
					: `Cannot be priced: ${(error as Error).message}`;
			unpriced.push({ ...who, reason });
		}
	}
	ranked.sort((a, b) => a.annualCost - b.annualCost || a.name.localeCompare(b.name));
	const current = ranked.find((r) => r.current);
	if (current) for (const r of ranked) r.differenceToCurrent = cents(r.annualCost - current.annualCost);
	const top = ranked[0];
	const topResult = top && results.get(top.id);
	const topVersion = topResult?.versions.at(-1)?.versionId;
	const topTariff = candidates.find((c) => c.id === top?.id)?.versions.find((v) => v.id === topVersion);
	const topShares =
		typeof base !== 'string' && topTariff && topResult
			? touShares({ ...base, tariff: topTariff.tariff }, topResult.totals.kwh)
			: [];
	return { ranked, unpriced, topShares, usage: usageOf(base, results.values().next().value) };
}

/**
 * The months of the load with their kWh and peak kW: from a priced result when there is one, else the
 * year priced once on the empty tariff of the base request (every figure but the money is the same).
 */
function usageOf(base: CalculateRequest | string, priced: VersionedResponse | undefined): UsageMonth[] {
	if (typeof base === 'string') return [];
	const periods = (priced ?? calculate(base)).periods;
	return periods.map((p) => ({ month: p.label, kwh: p.kwh, peakKw: p.peakKw }));
}
