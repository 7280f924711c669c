import { figure, moneyCents, percentText, yearsText } from '$lib/text/numbers';

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

/** Simple payback in words: "never", "at once" when the scenario costs no more to buy, else years. */
export const paybackYears = (years: number | null) =>
	years === null ? 'never' : years === 0 ? 'at once (no extra outlay)' : yearsText(years);

/** A share as a whole percent: "25 %". */
export const percent = (share: number) => percentText(share);
