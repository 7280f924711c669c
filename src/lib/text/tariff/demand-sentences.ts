/** A demand charge in words: one price or tiers per kW, the measured interval, its limits and ratchet. */
import type { TariffInput } from '$lib/calc';
import { daysText, figureText, limitsMonths, moneyText, monthsText, windowsText } from './rate-phrases';

export type DemandInput = NonNullable<TariffInput['demandCharges']>[number];
export type RatchetInput = NonNullable<DemandInput['ratchet']>;

/**
 * The days and hours a charge measures: "weekdays 12:00–20:00", "every day 17:00–21:00"; with other
 * hours at weekends "weekdays 00:00–15:00 and 20:00–24:00 and all day at weekends" (or "and at weekends
 * 17:00–19:00"); "" when it measures every hour of every day.
 */
export function demandHoursText(charge: DemandInput): string {
	const windows = windowsText(charge.windows);
	const weekend = charge.weekendWindows;
	if (weekend) {
		const whole = weekend.length === 1 && weekend[0]?.start === '00:00' && weekend[0]?.end === '24:00';
		return `weekdays ${windows} and ${whole ? 'all day at weekends' : `at weekends ${windowsText(weekend)}`}`;
	}
	if ((charge.days ?? 'all') === 'all' && !windows) return '';
	return [daysText(charge.days), windows].filter(Boolean).join(' ');
}

/**
 * "$8.00 per kW of the highest 15-minute demand in the billing period (weekdays 12:00–20:00,
 * June–September)"; the brackets hold only the limits the charge has; a ratchet follows after a
 * semicolon.
 */
export function demandText(charge: DemandInput, currency: string): string {
	const limits: string[] = [];
	const hours = demandHoursText(charge);
	if (hours) limits.push(hours);
	if (limitsMonths(charge.months)) limits.push(monthsText(charge.months));
	const minutes = charge.intervalMinutes ?? 15;
	const of = `of the highest ${minutes}-minute demand in the billing period`;
	const base = charge.tiers
		? `${demandTiersText(charge.tiers, currency)} ${of}`
		: `${moneyText(charge.perKw ?? 0, currency)} per kW ${of}`;
	const text = limits.length > 0 ? `${base} (${limits.join(', ')})` : base;
	return charge.ratchet ? `${text}; ${ratchetText(charge.ratchet)}` : text;
}

/** "$10.00 per kW for the first 100 kW, then $15.00 per kW" (a comma closes a ladder of tiers). */
export function demandTiersText(tiers: NonNullable<DemandInput['tiers']>, currency: string): string {
	let fromKw = 0;
	const parts = tiers.map((tier, i) => {
		const rate = `${moneyText(tier.perKw, currency)} per kW`;
		if (tier.uptoKw === null) return i === 0 ? rate : `then ${rate}`;
		const part =
			i === 0
				? `${rate} for the first ${figureText(tier.uptoKw)} kW`
				: `${rate} from ${figureText(fromKw)} to ${figureText(tier.uptoKw)} kW`;
		fromKw = tier.uptoKw;
		return part;
	});
	return parts.length > 1 ? `${parts.join(', ')},` : parts.join('');
}

/** "the 11 billing periods before" or "June–September of the 11 billing periods before". */
export function ratchetLookText(ratchet: RatchetInput): string {
	if (ratchet.months) return `${monthsText(ratchet.months)} of the 11 billing periods before`;
	const back = ratchet.monthsBack ?? 11;
	return back === 1 ? 'the billing period before' : `the ${back} billing periods before`;
}

/**
 * "billed on at least 80% of the highest peak of the 11 billing periods before (within this
 * calculation)": the core knows only the periods it prices, so earlier history does not count.
 */
export function ratchetText(ratchet: RatchetInput): string {
	const percent = `${figureText(ratchet.percent)}%`;
	return `billed on at least ${percent} of the highest peak of ${ratchetLookText(ratchet)} (within this calculation)`;
}
