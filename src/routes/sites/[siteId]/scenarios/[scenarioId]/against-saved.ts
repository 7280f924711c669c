import { money } from '$lib/text/numbers';

/**
 * The unsaved list's yearly cost against the saved list's, for the save bar: what the change being
 * made saves (negative) or adds (positive) a year, before the person saves it.
 */

/** The yearly difference, unsaved minus saved, to the cent; null while either cost is unknown. */
export function yearlyDifference(unsavedPerYear: number | null, savedPerYear: number | null): number | null {
	if (unsavedPerYear === null || savedPerYear === null) return null;
	return Math.round((unsavedPerYear - savedPerYear) * 100) / 100;
}

/**
 * The difference in words with its currency and sign: "−$1,582 a year against the saved list" (whole
 * units from 100 up, where cents would be noise; cents below), "+$4.38 …", or the same cost.
 */
export function againstSavedText(difference: number, currency: string): string {
	if (Math.abs(difference) < 0.005) return 'The same yearly cost as the saved list';
	const amount = money(Math.abs(difference), currency, Math.abs(difference) >= 100 ? 'whole' : 'minor');
	return `${difference < 0 ? '−' : '+'}${amount} a year against the saved list`;
}
