/**
 * The words beside the library's at-a-glance figure ("a typical month for 1 kW always on"), shared by the
 * tariff page and the editor's preview so that both say the same basis for the same number.
 */

/**
 * The basis of the figure: the calendar year's total divided by 12 (not 730 hours a month), so a
 *31-day month and February both count, and seasons and tiers average out.
 */
export function referenceBasisText(year: number, timezone: string): string {
	const zone = timezone.trim() ? ` in ${timezone.trim()}` : '';
	return `The ${year} calendar year${zone} divided by 12, with the tariff's public holidays.`;
}

/** "version 2, in force since 2026-01-01": which version a figure prices. */
export function versionInForceText(number: number, effectiveFrom: string): string {
	return `version ${number}, in force since ${effectiveFrom}`;
}
