/** A time-of-use season in words, with the tiers its periods may carry (limits across all its periods). */
import { type TouSeasonInput, figureText, moneyText, perKwhText, whenText } from './rate-phrases';

/** Whether tier bounds are per billing period (absent) or per day (× the billing period's days). */
export type TiersPer = 'period' | 'day' | undefined;

/** " a day" after a bound given per day. */
export function perDayWords(per: TiersPer): string {
	return per === 'day' ? ' a day' : '';
}

/**
 * One slot's prices on a season's tier limits: "$0.30 per kWh up to 500 kWh, $0.40 from 500 to 1,000
 * kWh, then $0.50". `first` adds what the limits count, said once a sentence.
 */
function ladderText(
	prices: readonly number[],
	limits: readonly number[],
	currency: string,
	per: TiersPer,
	first: boolean
): string {
	const day = perDayWords(per);
	const counted = first
		? per === 'day'
			? ` (× the days of the billing period) of the use across all periods`
			: ` of the billing period's use across all periods`
		: '';
	const parts = limits.map((limit, i) => {
		const price = moneyText(prices[i] ?? 0, currency);
		if (i === 0) return `${price} per kWh up to ${figureText(limit)} kWh${day}${counted}`;
		return `${price} from ${figureText(limits[i - 1] ?? 0)} to ${figureText(limit)} kWh${day}`;
	});
	parts.push(`then ${moneyText(prices[limits.length] ?? 0, currency)}`);
	return parts.join(', ');
}

/** "On-peak $0.32 per kWh on weekdays 16:00–21:00". */
export function touPeriodText(period: TouSeasonInput['periods'][number], currency: string): string {
	return `${period.label} ${perKwhText(period.perKwh, currency)} ${whenText(period.days, period.windows)}`;
}

/** "$0.12 per kWh at other times" (or "at all times" when the season has no periods). */
export function otherTimesText(season: TouSeasonInput, currency: string): string {
	const when = season.periods.length > 0 ? 'at other times' : 'at all times';
	return `${perKwhText(season.otherPerKwh, currency)} ${when}`;
}

/**
 * A season's periods, then its other rate, separated by semicolons. A season with tier limits gives
 * each period its price ladder: "On-peak on weekdays 16:00–21:00, $0.30 per kWh up to 500 kWh of the
 * billing period's use across all periods, then $0.40; at other times, $0.10 per kWh up to 500 kWh,
 * then $0.15".
 */
export function seasonText(season: TouSeasonInput, currency: string, per?: TiersPer): string {
	const limits = season.tierLimitsKwh ?? [];
	if (limits.length === 0) {
		const periods = season.periods.map((period) => touPeriodText(period, currency));
		return [...periods, otherTimesText(season, currency)].join('; ');
	}
	const periods = season.periods.map((period, p) => {
		const prices = [period.perKwh, ...(period.abovePerKwh ?? [])];
		const when = whenText(period.days, period.windows);
		return `${period.label} ${when}, ${ladderText(prices, limits, currency, per, p === 0)}`;
	});
	const other = [season.otherPerKwh, ...(season.otherAbovePerKwh ?? [])];
	const otherWhen = season.periods.length > 0 ? 'at other times' : 'at all times';
	const otherLadder = ladderText(other, limits, currency, per, season.periods.length === 0);
	return [...periods, `${otherWhen}, ${otherLadder}`].join('; ');
}

/** "500 and 1,000 kWh a day": a season's limits, for the version history. */
export function limitsText(limits: readonly number[], per: TiersPer): string {
	if (limits.length === 0) return 'none';
	const figures = limits.map(figureText);
	const joined =
		figures.length === 1 ? figures[0] : `${figures.slice(0, -1).join(', ')} and ${figures.at(-1)}`;
	return `${joined} kWh${perDayWords(per)}`;
}
