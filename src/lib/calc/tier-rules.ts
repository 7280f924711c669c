import type { RuleIssue } from './tariff';

/**
 * Structural rules of the tiered charges real tariffs use (tiers inside time-of-use periods, tiered
 * demand, ratchets), which field-by-field validation cannot see. Paths are relative to the value checked.
 */

/** Tier limits rise: each is above the one before (the first above zero is checked by the field). */
export function limitIssues(limits: readonly number[]): RuleIssue[] {
	const issues: RuleIssue[] = [];
	limits.forEach((limit, i) => {
		const previous = limits[i - 1];
		if (previous !== undefined && limit <= previous) {
			issues.push({ path: [i], message: `Each tier limit must be above the one before (${previous} kWh)` });
		}
	});
	return issues;
}

interface TieredSeason {
	tierLimitsKwh?: readonly number[] | undefined;
	otherAbovePerKwh?: readonly number[] | undefined;
	periods: ReadonlyArray<{ label: string; abovePerKwh?: readonly number[] | undefined }>;
}

/**
 * A season with tier limits prices every period (and the hours of no period) in as many tiers: each
 * period, and "other", gives one price above each limit. A season without limits has no such prices.
 */
export function seasonTierIssues(season: TieredSeason): RuleIssue[] {
	const count = season.tierLimitsKwh?.length ?? 0;
	const issues: RuleIssue[] = [];
	const check = (prices: readonly number[] | undefined, path: Array<string | number>, whose: string) => {
		if (count === 0 && prices !== undefined && prices.length > 0) {
			issues.push({
				path,
				message: `${whose} has prices above tier limits, but the season has no tier limits`
			});
		} else if (count > 0 && (prices?.length ?? 0) !== count) {
			const limits = count === 1 ? 'one tier limit' : `${count} tier limits`;
			issues.push({
				path,
				message: `${whose} needs one price above each tier limit: the season has ${limits}`
			});
		}
	};
	season.periods.forEach((period, p) =>
		check(period.abovePerKwh, ['periods', p, 'abovePerKwh'], `“${period.label}”`)
	);
	check(season.otherAbovePerKwh, ['otherAbovePerKwh'], 'The hours of no period');
	return issues;
}

/** Demand tiers end at increasing kW and only the last is open-ended (`uptoKw: null`). */
export function demandTierIssues(tiers: ReadonlyArray<{ uptoKw: number | null }>): RuleIssue[] {
	const issues: RuleIssue[] = [];
	let previous = 0;
	tiers.forEach((tier, i) => {
		const last = i === tiers.length - 1;
		if (last && tier.uptoKw !== null) {
			issues.push({ path: [i, 'uptoKw'], message: 'The last demand tier must be open-ended (uptoKw null)' });
		} else if (!last && tier.uptoKw === null) {
			issues.push({
				path: [i, 'uptoKw'],
				message: 'Only the last demand tier can be open-ended (uptoKw null)'
			});
		} else if (tier.uptoKw !== null && tier.uptoKw <= previous) {
			issues.push({
				path: [i, 'uptoKw'],
				message: `Each demand tier must end above the one before (${previous} kW)`
			});
		}
		previous = tier.uptoKw ?? previous;
	});
	return issues;
}

/** A demand charge has one price per kW or tiers, not both and not neither. */
export function demandPriceIssues(charge: {
	perKw?: number | undefined;
	tiers?: readonly unknown[] | undefined;
}): RuleIssue[] {
	const both = charge.perKw !== undefined && charge.tiers !== undefined;
	const neither = charge.perKw === undefined && charge.tiers === undefined;
	if (both) return [{ path: ['tiers'], message: 'Give a price per kW or demand tiers, not both' }];
	if (neither) return [{ path: ['perKw'], message: 'Per kW is required (or give demand tiers)' }];
	return [];
}

/** A ratchet looks back a number of months or at listed months, one of the two. */
export function ratchetIssues(ratchet: {
	monthsBack?: number | undefined;
	months?: readonly number[] | undefined;
}): RuleIssue[] {
	if (ratchet.monthsBack !== undefined && ratchet.months !== undefined) {
		return [
			{ path: ['months'], message: 'Give the months back or the listed months of a ratchet, not both' }
		];
	}
	if (ratchet.monthsBack === undefined && ratchet.months === undefined) {
		return [
			{ path: ['monthsBack'], message: 'Months back is required (or list the months the ratchet looks at)' }
		];
	}
	return [];
}
