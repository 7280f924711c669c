import { money } from '$lib/text/numbers';
import { MONTH_NAMES, figure, powerForm, powerEcho } from './device-fields';

// Words and figures for a device as a viewer sees it, and for the live share of each row.

/** kWh for display: one decimal below 100, whole numbers above. */
export function kwhText(kwh: number): string {
	return figure(kwh, Math.abs(kwh) < 100 ? 1 : 0);
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

/** Active months in words: "All year", or "Jan, Feb, Dec". */
export function monthsText(months: readonly number[] | undefined): string {
	if (!months) return 'All year';
	if (months.length === 0) return 'None';
	return months.map((month) => MONTH_NAMES[month - 1]?.slice(0, 3) ?? String(month)).join(', ');
}
