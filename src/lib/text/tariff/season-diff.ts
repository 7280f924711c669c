/** The version history's words for one time-of-use season: its periods, its tier limits and prices. */
import { type TouSeasonInput, figureText, labelWithMonths, moneyText, whenText } from './rate-phrases';
import { type TiersPer, limitsText, perDayWords, touPeriodText } from './tou-sentences';
import { diffList } from './pair-by-label';

/** "up to 500 kWh", "500 to 1,000 kWh", "above 1,000 kWh" (a day, when the limits are per day). */
function bandName(limits: readonly number[], i: number, per: TiersPer): string {
	const day = perDayWords(per);
	if (limits.length === 0) return '';
	if (i === 0) return ` up to ${figureText(limits[0] ?? 0)} kWh${day}`;
	if (i >= limits.length) return ` above ${figureText(limits[limits.length - 1] ?? 0)} kWh${day}`;
	return ` ${figureText(limits[i - 1] ?? 0)} to ${figureText(limits[i] ?? 0)} kWh${day}`;
}

/** One line per tier price that changed: "Energy, June–September, On-peak above 500 kWh: $0.40 → $0.45 per kWh". */
function ladderChanges(
	name: string,
	a: readonly number[],
	b: readonly number[],
	limits: readonly number[],
	per: TiersPer,
	money: [string, string]
): string[] {
	return b.flatMap((price, i) => {
		const old = a[i];
		if (old === undefined || old === price) return [];
		const rates = `${moneyText(old, money[0])} → ${moneyText(price, money[1])} per kWh`;
		return [`${name}${bandName(limits, i, per)}: ${rates}`];
	});
}

/**
 * What changed in a season whose months stayed the same, one line per change: a period's price (each
 * tier's price on its own), its hours, an added or removed period, the price at other times, and the
 * tier limits ("Energy, June–September: tier limits 500 → 600 kWh").
 */
export function seasonChanges(
	label: string,
	a: TouSeasonInput,
	b: TouSeasonInput,
	money: [string, string],
	per: TiersPer
): string[] {
	const name = labelWithMonths(label, b.months);
	const limitsA = a.tierLimitsKwh ?? [];
	const limitsB = b.tierLimitsKwh ?? [];
	const lines: string[] = [];
	const sameLimits = limitsA.join('|') === limitsB.join('|');
	if (!sameLimits) {
		lines.push(`${name}: tier limits ${limitsText(limitsA, per)} → ${limitsText(limitsB, per)}`);
	}
	// When the limits moved, a tier's price is compared only where both versions have that tier.
	const prices = (first: number, above: readonly number[] | undefined) => [first, ...(above ?? [])];
	lines.push(
		...diffList(a.periods, b.periods, {
			added: (period) => `${name}: added ${touPeriodText(period, money[1])}`,
			removed: (period) => `${name}: ${period.label} removed`,
			changed: (x, y) => [
				...ladderChanges(
					`${name}, ${y.label}`,
					prices(x.perKwh, sameLimits ? x.abovePerKwh : []),
					prices(y.perKwh, y.abovePerKwh),
					limitsB,
					per,
					money
				),
				...(whenText(x.days, x.windows) !== whenText(y.days, y.windows)
					? [`${name}, ${y.label}: now ${whenText(y.days, y.windows)}`]
					: [])
			]
		}),
		...ladderChanges(
			`${name}, other times`,
			prices(a.otherPerKwh, sameLimits ? a.otherAbovePerKwh : []),
			prices(b.otherPerKwh, b.otherAbovePerKwh),
			limitsB,
			per,
			money
		)
	);
	return lines;
}
