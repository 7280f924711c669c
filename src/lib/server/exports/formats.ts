import { DateTime } from 'luxon';
import { MONTH_ABBREVIATIONS } from '$lib/calc';
import type { MonthFigures } from './figures';

/** Number formats of the workbook, with money in one currency. */
export interface Formats {
	money: string;
	/** Per kWh and per kW rates: up to five decimals, as tariffs publish them. */
	rate: string;
	kwh: string;
	kw: string;
	hours: string;
	percent: string;
	years: string;
	fraction: string;
	whole: string;
}

/**
 * Symbols found so far: making an Intl.NumberFormat costs more than all the rest of a small workbook's
 * formats. At most 32 are kept (the map is emptied when full).
 */
const symbols = new Map<string, string>();
const KEPT_CURRENCIES = 32;

/** The symbol a reader knows the currency by ("$", "€", "CA$"), or its code. */
function currencySymbol(currency: string): string {
	let symbol = symbols.get(currency);
	if (symbol === undefined) {
		try {
			const parts = new Intl.NumberFormat('en-US', { style: 'currency', currency }).formatToParts(1);
			symbol = parts.find((part) => part.type === 'currency')?.value ?? currency;
		} catch {
			symbol = currency;
		}
		if (symbols.size >= KEPT_CURRENCIES) symbols.clear();
		symbols.set(currency, symbol);
	}
	return symbol;
}

export function formatsFor(currency: string): Formats {
	const symbol = `"${currencySymbol(currency).replaceAll('"', '')}"`;
	return {
		money: `${symbol}#,##0.00`,
		rate: `${symbol}0.00###`,
		// Whole kWh would hide a small device's month; a tenth is as fine as a meter reads.
		kwh: '#,##0.0',
		kw: '#,##0.000',
		hours: '#,##0.00',
		percent: '0.00%',
		years: '0.00',
		fraction: '0.0000',
		whole: '0'
	};
}

/**
 * When the workbook was made, in words and in the comparison's time zone:
 * "2 December 2026, 03:30 (America/Chicago)" — not an ISO timestamp a reader must decode.
 */
export function madeText(generatedAt: string, timezone: string): string {
	const made = DateTime.fromISO(generatedAt, { zone: 'utc' }).setZone(timezone);
	const at = made.isValid ? made : DateTime.fromISO(generatedAt, { zone: 'utc' });
	return `${at.toFormat('d MMMM yyyy, HH:mm', { locale: 'en-GB' })} (${at.zoneName ?? 'UTC'})`;
}

/** "Jan 2027", for month columns. */
export function monthHeading(month: MonthFigures): string {
	return `${MONTH_ABBREVIATIONS[month.month - 1] ?? month.label} ${month.year}`;
}

/**
 * A sheet name from a scenario's position and name: at most 31 characters, none of the characters a
 * sheet name may not hold (and no apostrophes, so references never need escaping).
 */
export function scenarioSheetName(index: number, name: string): string {
	const clean = name
		.replace(/[\\/?*[\]:']/g, ' ')
		.replace(/\s+/g, ' ')
		.trim();
	return `${index + 1} ${clean}`.slice(0, 31).trim();
}
