/**
 * Numbers and money as Runrate writes them, in US English on every page: one module so that the
 * same figure reads the same everywhere, and so each `Intl.NumberFormat` is built once and reused
 * (building one costs far more than using it, and a table may format thousands of cells).
 * Client-safe: no server, Svelte or core imports.
 */

/** How many decimals a money figure shows. */
export type MoneyDigits =
	/** The currency's own minor digits, as a bill prints it: "$12.50", "¥1,250". */
	| 'minor'
	/** Always two decimals, for tables of cents: "$12.50". */
	| 'cents'
	/** Whole currency units, for sentences that say "about": "$13". */
	| 'whole'
	/** Up to four decimals, for a price per kWh: "$0.1234". */
	| 'perKwh'
	/** Compact, for a chart axis: "$1.2K". */
	| 'compact'
	/**
	 * The currency's own minor digits and up to five, for a tariff's rates: a per-kWh rate such as
	 * 0.03125 must not be rounded away on the page that explains it ("$0.03125", "$12.50").
	 */
	| 'rate';

const MONEY_DIGITS: Record<MoneyDigits, Intl.NumberFormatOptions> = {
	minor: {},
	cents: { minimumFractionDigits: 2, maximumFractionDigits: 2 },
	whole: { maximumFractionDigits: 0 },
	perKwh: { maximumFractionDigits: 4 },
	compact: { notation: 'compact', maximumFractionDigits: 1 },
	rate: {}
};

/** The currency's own minor digits (2 for USD, 0 for JPY); throws for a code the browser does not know. */
function minorDigits(currency: string): number {
	return (
		new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().minimumFractionDigits ??
		2
	);
}

const moneyFormats = new Map<string, Intl.NumberFormat | null>();
const figureFormats = new Map<number, Intl.NumberFormat>();

/**
 * The money formatter for a currency code, or null for a code the browser does not know (an
 * unsaved draft, a blank field), so each caller can say such an amount its own way.
 */
export function moneyFormat(currency: string, digits: MoneyDigits = 'minor'): Intl.NumberFormat | null {
	const key = `${currency}|${digits}`;
	if (!moneyFormats.has(key)) {
		let format: Intl.NumberFormat | null;
		try {
			const options =
				digits === 'rate'
					? {
							minimumFractionDigits: minorDigits(currency),
							maximumFractionDigits: Math.max(minorDigits(currency), 5)
						}
					: MONEY_DIGITS[digits];
			format = new Intl.NumberFormat('en-US', { style: 'currency', currency, ...options });
		} catch {
			format = null;
		}
		moneyFormats.set(key, format);
	}
	return moneyFormats.get(key) ?? null;
}

/**
 * An amount in a currency ("$1,234.50"); a code the browser does not know shows the figure with
 * up to two decimals and the code after it ("1,234.5 XX").
 */
export function money(amount: number, currency: string, digits: MoneyDigits = 'minor'): string {
	return moneyFormat(currency, digits)?.format(amount) ?? `${figure(amount, 2)} ${currency}`;
}

/** An amount with exactly two decimals, as the comparison and bill tables show it: "$12.50". */
export const moneyCents = (amount: number, currency: string): string => money(amount, currency, 'cents');

/** An amount in whole currency units, for sentences that round: "$1,235". */
export const moneyWhole = (amount: number, currency: string): string => money(amount, currency, 'whole');

/** A price per kWh with up to four decimals: "$0.1234" (the unit is the caller's words). */
export const moneyPerKwh = (amount: number, currency: string): string => money(amount, currency, 'perKwh');

/** A figure with up to `digits` decimals and thousands separators: 3187.3 → "3,187" at 0 digits. */
export function figure(value: number, digits: number): string {
	let format = figureFormats.get(digits);
	if (!format) {
		format = new Intl.NumberFormat('en-US', { maximumFractionDigits: digits });
		figureFormats.set(digits, format);
	}
	return format.format(value);
}

/** Energy with its unit: "1,234 kWh" (whole kWh unless `digits` says otherwise). */
export const kwhText = (kwh: number, digits = 0): string => `${figure(kwh, digits)} kWh`;

/** Power with its unit: "1.5 kW" (one decimal unless `digits` says otherwise). */
export const kwText = (kw: number, digits = 1): string => `${figure(kw, digits)} kW`;

/** A share (0.25) as a whole percent with a space before the sign, as the reports write it: "25 %". */
export const percentText = (share: number, digits = 0): string => `${figure(share * 100, digits)} %`;

/** A span of years to one decimal: "2.3 years". */
export const yearsText = (years: number, digits = 1): string => `${figure(years, digits)} years`;
