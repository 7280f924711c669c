// How a metered year falls into a time-of-use tariff's periods, measured by the core itself.
import { calculate, type CalculateRequest, type EnergyCharge, type Tariff } from '$lib/calc';

type TouCharge = Extract<EnergyCharge, { type: 'tou' }>;

/** The share of the year's kWh in one period label of a time-of-use charge, and its prices per kWh. */
export type TouShare = { label: string; share: number; minPerKwh: number; maxPerKwh: number };

/** The name used for the hours no period of a season covers. */
export const OTHER_HOURS = 'other hours';

const ones = (prices: readonly number[] | undefined, value: number) => prices?.map(() => value);

/** The charge with price 1 in the hours `isThem` picks and 0 elsewhere, at every tier: its cost is their kWh. */
function probe(charge: TouCharge, label: string | null): TouCharge {
	return {
		...charge,
		seasons: charge.seasons.map((season) => ({
			...season,
			otherPerKwh: label === null ? 1 : 0,
			otherAbovePerKwh: ones(season.otherAbovePerKwh, label === null ? 1 : 0),
			periods: season.periods.map((period) => ({
				...period,
				perKwh: period.label === label ? 1 : 0,
				abovePerKwh: ones(period.abovePerKwh, period.label === label ? 1 : 0)
			}))
		}))
	};
}

/**
 * Each period label's share of `totalKwh` under the tariff's first time-of-use charge, with the range of
 * its prices across seasons (the lowest tier). Measured by pricing the year once on a probe tariff whose
 * every charge costs 1 per kWh in one label's hours and nothing elsewhere, so the core's own calendar,
 * holidays and daylight-saving rules decide which hour is which — no second reading of the schedule.
 * Empty when the tariff has no time-of-use charge or the year has no use.
 */
export function touShares(request: CalculateRequest, totalKwh: number): TouShare[] {
	const tou = request.tariff.energyCharges.find((c): c is TouCharge => c.type === 'tou');
	if (!tou || totalKwh <= 0) return [];
	const labels = [...new Set(tou.seasons.flatMap((s) => s.periods.map((p) => p.label)))];
	const buckets: (string | null)[] = [...labels, null];
	const probeTariff: Tariff = {
		...request.tariff,
		fixedCharges: [],
		demandCharges: [],
		riders: [],
		taxes: [],
		minimumMonthly: null,
		minimumPerDay: null,
		minimumPerYear: null,
		energyCharges: buckets.map((label, i) => ({ ...probe(tou, label), label: `bucket ${i}` }))
	};
	const result = calculate({ ...request, tariff: probeTariff });
	const kwhIn = buckets.map((_, i) =>
		result.periods.reduce(
			(sum, p) => sum + (p.charges.find((c) => c.label === `bucket ${i}`)?.amount ?? 0),
			0
		)
	);
	return buckets
		.map((label, i) => {
			const prices =
				label === null
					? tou.seasons.map((s) => s.otherPerKwh)
					: tou.seasons.flatMap((s) => s.periods.filter((p) => p.label === label).map((p) => p.perKwh));
			return {
				label: label ?? OTHER_HOURS,
				share: kwhIn[i]! / totalKwh,
				minPerKwh: Math.min(...prices),
				maxPerKwh: Math.max(...prices)
			};
		})
		.filter((s) => s.share > 0.0005);
}
