import { figure, moneyCents, percentText } from '$lib/text/numbers';
import { CO2_NOT_SET, PAYBACK_WORDS } from '$lib/text/output-labels';
import type { ComparisonQuery } from './types';

/** Number words for the comparison's tables: cents for money, whole kWh and kg, payback in years. */
export const cents = moneyCents;

/** A difference in cents with its sign ("+$1.20", "−$0.50"), or a dash when it rounds to nothing. */
export const signedCents = (amount: number, currency: string) =>
	Math.abs(amount) < 0.005 ? '—' : `${amount > 0 ? '+' : '−'}${cents(Math.abs(amount), currency)}`;

/** A whole number with thousands separators: kWh and kg in the tables. */
export const wholeNumber = (n: number) => figure(n, 0);

/** A whole-number difference with its sign, or a dash when it rounds to nothing. */
export const signedWhole = (n: number) =>
	Math.abs(n) < 0.5 ? '—' : `${n > 0 ? '+' : '−'}${wholeNumber(Math.abs(n))}`;

/**
 * Payback years to two decimals, since a retrofit often pays back within a year ("0.74 years"); past
 * ten years one decimal says enough.
 */
export const paybackYearsFigure = (years: number) =>
	`${figure(years, years >= 10 ? 1 : 2)} ${years === 1 ? 'year' : 'years'}`;

/** Simple payback in words: "never", "at once" when the scenario costs no more to buy, else years. */
export const paybackYears = (years: number | null) =>
	years === null ? PAYBACK_WORDS.never : years === 0 ? PAYBACK_WORDS.atOnce : paybackYearsFigure(years);

/**
 * Whether the comparison has an emission factor: it starts unset (0), and CO₂ reads "not set" until
 * someone gives one. A grid with truly no emissions is not a case a grower meets (common practice).
 */
export const emissionFactorSet = (query: Pick<ComparisonQuery, 'emissionKgPerKwh'>) =>
	query.emissionKgPerKwh > 0;

/** CO₂ kg as a whole number, or "not set" while there is no emission factor. */
export const co2Text = (kg: number, query: Pick<ComparisonQuery, 'emissionKgPerKwh'>) =>
	emissionFactorSet(query) ? wholeNumber(kg) : CO2_NOT_SET;

/** A share as a whole percent: "25 %". */
export const percent = (share: number) => percentText(share);
