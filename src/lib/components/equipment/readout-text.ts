import { money } from '$lib/text/numbers';
import { monthsText as monthRuns } from '$lib/text/tariff';
import { figure, powerForm, powerEcho } from './device-fields';
import type { DeviceSpec } from './equipment-table';
import { scheduleSummary } from './schedule-strip';

// Words and figures for a device as a viewer sees it, and for the live share of each row.

/** kWh for display: one decimal below 100, whole numbers above. */
export function kwhText(kwh: number): string {
	return figure(kwh, Math.abs(kwh) < 100 ? 1 : 0);
}

/**
 * The month a row's figures are in: "an average month (730 h)", a twelfth of the year, so it is not
 * taken for a calendar month (a 31-day month has 744 h).
 */
export function averageMonthWords(monthHours = 730): string {
	return `an average month (${figure(monthHours, 0)} h)`;
}

/** A money formatter for a currency code; a code the browser does not know falls back to plain figures. */
export function moneyFormat(currency: string): (amount: number) => string {
	return (amount) => money(amount, currency);
}

/** A power as it was entered: "100 W", or "0.9 A × 120 V, power factor 0.8, three phase". */
export function powerText(power: unknown): string {
	if (power === null || typeof power !== 'object') return '—';
	const p = power as Record<string, unknown>;
	const num = (value: unknown) => (typeof value === 'number' ? figure(value, 3) : '?');
	if (powerForm(power) === 'watts') return `${num(p.watts)} W`;
	const parts = [`${num(p.amps)} A × ${num(p.volts)} V`];
	if (typeof p.powerFactor === 'number' && p.powerFactor !== 1)
		parts.push(`power factor ${num(p.powerFactor)}`);
	if (p.phases === 3) parts.push('three phase');
	const echo = powerEcho(power);
	return `${parts.join(', ')}${echo ? ` (${echo})` : ''}`;
}

/** Active months in words: "All year", or runs of the calendar ("May–November", "December–February"). */
export function monthsText(months: readonly number[] | undefined): string {
	if (!months) return 'All year';
	const words = monthRuns(months);
	return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The duty cycle as typed, when it is a figure below 100 %; anything else (empty, half typed) is full time. */
function dutyBelowFull(dutyPercent: unknown): number | null {
	return typeof dutyPercent === 'number' &&
		Number.isFinite(dutyPercent) &&
		dutyPercent >= 0 &&
		dutyPercent < 100
		? dutyPercent
		: null;
}

/**
 * How a device runs, in the words of its row: the schedule, the duty cycle and the active months
 * together, so a heater on at 35 % duty from May to November reads "35 % of the time, May–November",
 * never "Always on". An always-on schedule at part duty is the share of the time; other schedules add
 * "at 35 % duty"; a month limit comes last.
 */
export function runningText(spec: Pick<DeviceSpec, 'schedule' | 'dutyPercent' | 'months'>): string {
	const duty = dutyBelowFull(spec.dutyPercent);
	const always = spec.schedule?.type === 'always';
	const parts = [
		always && duty !== null ? `${figure(duty, 1)} % of the time` : scheduleSummary(spec.schedule)
	];
	if (!always && duty !== null) parts.push(`at ${figure(duty, 1)} % duty`);
	const months = spec.months ? monthRuns(spec.months) : 'all year';
	if (months !== 'all year') parts.push(months);
	return parts.join(', ');
}
