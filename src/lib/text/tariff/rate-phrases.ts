/** The small phrases a rate is written with: money in the tariff's currency, months, clock windows, days. */
import { MONTH_NAMES, type Tariff, type TariffInput } from '$lib/calc';

/**
 * The small phrases the tariff's plain-words description is built from: money in the tariff's
 * currency, month ranges, clock windows and day selectors. Shared by `describeTariff`, the diff of two
 * versions and the tariff charts, so a rate reads the same everywhere on the page.
 */

export type AnyTariff = TariffInput | Tariff;
export type EnergyInput = NonNullable<TariffInput['energyCharges']>[number];
export type TouSeasonInput = Extract<EnergyInput, { type: 'tou' }>['seasons'][number];
export type TierInput = Extract<EnergyInput, { type: 'tiered' }>['tiers'][number];
export type DaysInput = 'all' | 'weekdays' | 'weekends' | undefined;
import { figure, moneyFormat } from '../numbers';

export interface WindowInput {
	start: string;
	end: string;
}

/** An amount in the tariff's currency: `moneyText(0.031, 'USD')` is "$0.031", 12.5 is "$12.50". */
export function moneyText(amount: number, currency: string): string {
	const format = moneyFormat(currency.trim().toUpperCase(), 'rate');
	// A malformed code (the schema refuses these, an unsaved draft may not): show it as typed.
	return format ? format.format(amount) : `${currency} ${figure(amount, 5)}`;
}

/** "$0.18 per kWh". */
export function perKwhText(perKwh: number, currency: string): string {
	return `${moneyText(perKwh, currency)} per kWh`;
}

/** A plain figure: 4 is "4", 1000 is "1,000", 4.125 is "4.125". */
export function figureText(value: number): string {
	return value.toLocaleString('en-US', { maximumFractionDigits: 5 });
}

/** "A, B and C". */
export function listText(items: readonly string[]): string {
	if (items.length <= 1) return items[0] ?? '';
	return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

const nextMonth = (month: number) => (month % 12) + 1;
const previousMonth = (month: number) => ((month + 10) % 12) + 1;

/**
 * Months as runs of the calendar, wrapping past December: [6, 7, 8, 9] is "June–September",
 * [10, 11, 12, 1, 2, 3, 4, 5] is "October–May", [1, 2, 6] is "January–February and June".
 */
export function monthsText(months: readonly number[] | undefined): string {
	const set = new Set((months ?? []).filter((m) => Number.isInteger(m) && m >= 1 && m <= 12));
	if (set.size === 12) return 'all year';
	if (set.size === 0) return 'no months';
	const runs: string[] = [];
	for (let month = 1; month <= 12; month++) {
		if (!set.has(month) || set.has(previousMonth(month))) continue;
		let end = month;
		while (set.has(nextMonth(end))) end = nextMonth(end);
		const first = MONTH_NAMES[month - 1] ?? '';
		runs.push(end === month ? first : `${first}–${MONTH_NAMES[end - 1] ?? ''}`);
	}
	return listText(runs);
}

/** Whether a list of months limits a charge (absent, empty or all twelve do not). */
export function limitsMonths(months: readonly number[] | undefined): months is readonly number[] {
	return months !== undefined && months.length > 0 && monthsText(months) !== 'all year';
}

/** "16:00–21:00", several joined with "and"; a window ending before it starts wraps past midnight. */
export function windowsText(windows: readonly WindowInput[] | undefined): string {
	return listText((windows ?? []).map((window) => `${window.start}–${window.end}`));
}

/** "weekdays", "weekends" or "every day". */
export function daysText(days: DaysInput): string {
	return { all: 'every day', weekdays: 'weekdays', weekends: 'weekends' }[days ?? 'all'];
}

/** When a time-of-use period applies: "on weekdays 16:00–21:00", "every day 22:00–06:00". */
export function whenText(days: DaysInput, windows: readonly WindowInput[] | undefined): string {
	const dayWords = days === 'weekdays' || days === 'weekends' ? `on ${days}` : 'every day';
	const times = windowsText(windows);
	return times ? `${dayWords} ${times}` : dayWords;
}

/** "Energy", "Energy, June–September": the label with the months a charge is limited to. */
export function labelWithMonths(label: string, months: readonly number[] | undefined): string {
	return limitsMonths(months) ? `${label}, ${monthsText(months)}` : label;
}
