import { MONTH_NAMES } from './months';
import {
	type ClockWindow,
	type DaySelector,
	INTERVAL_MINUTES,
	SLOTS_PER_DAY,
	clockMinutes,
	clockText,
	daysMatch,
	slotMask
} from './clock';

/**
 * Structural rules of a tariff that field-by-field validation cannot see. Each returns issues with
 * paths relative to the checked value, so the schema can report them (the API answers 400).
 */
export interface RuleIssue {
	path: Array<string | number>;
	message: string;
}

/** Tiers end at increasing kWh, and only the last is open-ended (`uptoKwh: null`). */
export function tierIssues(tiers: ReadonlyArray<{ uptoKwh: number | null }>): RuleIssue[] {
	const issues: RuleIssue[] = [];
	let previous = 0;
	tiers.forEach((tier, i) => {
		const last = i === tiers.length - 1;
		if (last && tier.uptoKwh !== null) {
			issues.push({ path: [i, 'uptoKwh'], message: 'The last tier must be open-ended (uptoKwh null)' });
		} else if (!last && tier.uptoKwh === null) {
			issues.push({ path: [i, 'uptoKwh'], message: 'Only the last tier can be open-ended (uptoKwh null)' });
		} else if (tier.uptoKwh !== null && tier.uptoKwh <= previous) {
			issues.push({
				path: [i, 'uptoKwh'],
				message: `Each tier must end above the one before (${previous} kWh)`
			});
		}
		previous = tier.uptoKwh ?? previous;
	});
	return issues;
}

/**
 * Each month the charge applies (all twelve, or its `months` when it is limited to some) belongs to
 * exactly one season; a season may not hold a month the charge does not apply in. A summer-only
 * time-of-use adder is then one charge limited to June–September with one season, not a dummy
 * all-zero season for the other months.
 */
export function seasonCoverageIssues(
	seasons: ReadonlyArray<{ months: readonly number[] }>,
	chargeMonths?: readonly number[]
): RuleIssue[] {
	const issues: RuleIssue[] = [];
	const applies = new Set(chargeMonths ?? [...Array(12).keys()].map((i) => i + 1));
	const owner = new Map<number, number>();
	seasons.forEach((season, s) => {
		season.months.forEach((month, m) => {
			const name = `Month ${month} (${MONTH_NAMES[month - 1] ?? month})`;
			if (!applies.has(month)) {
				issues.push({
					path: [s, 'months', m],
					message: `${name} is not one of the months this charge applies`
				});
			} else if (owner.has(month)) {
				issues.push({ path: [s, 'months', m], message: `${name} is already in an earlier season` });
			} else owner.set(month, s);
		});
	});
	const missing = [...applies].sort((a, b) => a - b).filter((month) => !owner.has(month));
	if (missing.length > 0) {
		const names = missing.map((month) => `${month} (${MONTH_NAMES[month - 1]})`).join(', ');
		const which = chargeMonths
			? 'Every month this charge applies needs a season'
			: 'Every month needs a season';
		issues.push({ path: [], message: `${which}; missing: ${names}` });
	}
	return issues;
}

interface TouPeriodShape {
	label: string;
	days: DaySelector;
	windows: readonly ClockWindow[];
}

/** No two periods of a season cover the same quarter hour on the same kind of day. */
export function periodOverlapIssues(periods: readonly TouPeriodShape[]): RuleIssue[] {
	const issues: RuleIssue[] = [];
	const masks = periods.map((period) => slotMask(period.windows));
	const reported = new Set<string>();
	for (const weekend of [false, true]) {
		for (let slot = 0; slot < SLOTS_PER_DAY; slot++) {
			let first = -1;
			periods.forEach((period, p) => {
				if (!daysMatch(period.days, weekend) || masks[p]?.[slot] !== 1) return;
				if (first < 0) first = p;
				else if (!reported.has(`${first}|${p}`)) {
					reported.add(`${first}|${p}`);
					const other = periods[first]?.label ?? '';
					const when = `${weekend ? 'weekends' : 'weekdays'} at ${clockText(slot * INTERVAL_MINUTES)}`;
					issues.push({ path: [p, 'windows'], message: `“${period.label}” overlaps “${other}” on ${when}` });
				}
			});
		}
	}
	return issues;
}

/** Hourly demand is the mean of a clock hour, so its windows must begin and end on the hour. */
export function hourlyWindowIssues(windows: readonly ClockWindow[] | undefined): RuleIssue[] {
	return (windows ?? []).flatMap((window, i) =>
		(['start', 'end'] as const)
			.filter((end) => {
				const minute = clockMinutes(window[end]);
				return !Number.isNaN(minute) && minute % 60 !== 0;
			})
			.map((end) => ({
				path: [i, end],
				message: 'Windows of 60-minute demand must start and end on the hour'
			}))
	);
}
