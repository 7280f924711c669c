/** Month names in English, January first; index 0 is month 1. One list for the core and the UI. */
export const MONTH_NAMES = [
	'January',
	'February',
	'March',
	'April',
	'May',
	'June',
	'July',
	'August',
	'September',
	'October',
	'November',
	'December'
] as const;

/** "Jan" … "Dec", for compact controls and chart axes. */
export const MONTH_ABBREVIATIONS = MONTH_NAMES.map((name) => name.slice(0, 3));
