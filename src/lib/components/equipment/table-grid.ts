/**
 * The desk layout's columns, shared by the header and every row so they line up: name, category,
 * quantity, power, schedule, the live share, and the row's buttons. Under 1024 px rows are cards.
 */
export const DESK_GRID =
	'lg:grid lg:grid-cols-[minmax(0,1.4fr)_minmax(0,1fr)_4.5rem_minmax(0,2fr)_minmax(0,1.6fr)_6.5rem_6rem] lg:gap-3';

/**
 * The card layout under 1024 px: on a phone, name above category and quantity side by side, the rest
 * full width; from 640 px, name, category and quantity on one line.
 */
export const CARD_GRID =
	'grid grid-cols-[minmax(0,1fr)_5.5rem] gap-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_5.5rem] lg:items-start';

/** Where each kind of problem lives in a row: these paths sit in the Details part. */
export const DETAIL_PATHS = [
	'schedule',
	'months',
	'dutyPercent',
	'standbyWatts',
	'purchaseCost',
	'installCost',
	'lifeYears',
	'maintenancePerYear'
] as const;

/** How many of a row's problems are inside its Details part (so a closed part still says so). */
export function detailIssueCount(paths: readonly { path: string }[]): number {
	return paths.filter(({ path }) => DETAIL_PATHS.some((top) => path === top || path.startsWith(`${top}.`)))
		.length;
}
