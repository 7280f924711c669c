// Intl rather than Luxon: the printed pages run this in the browser too, and Luxon would be 20 kB of
// their JavaScript for one date.

// One formatter per time zone: making one costs far more than formatting a date (a workbook formats
// several per tariff). At most 32 are kept (the map is emptied when full), whatever zones are stored.
const KEPT_ZONES = 32;
const formatters = new Map<string, Intl.DateTimeFormat>();
function inWords(timeZone: string): Intl.DateTimeFormat {
	let formatter = formatters.get(timeZone);
	if (!formatter) {
		formatter = new Intl.DateTimeFormat('en-GB', {
			day: 'numeric',
			month: 'long',
			year: 'numeric',
			timeZone
		});
		if (formatters.size >= KEPT_ZONES) formatters.clear();
		formatters.set(timeZone, formatter);
	}
	return formatter;
}

/**
 * A date in words in a site's time zone, as a printed report states it: "3 December 2026". A report
 * printed late in the evening at the site says the site's day, not the server's. A zone the platform
 * does not know falls back to UTC; a date that cannot be read is given as it was stored.
 */
export function dateInWords(iso: string, timezone: string): string {
	// A time without an offset is UTC here (Date would read it as the machine's local time).
	const at = new Date(/T[\d:.]+$/.test(iso) ? `${iso}Z` : iso);
	if (Number.isNaN(at.getTime())) return iso;
	try {
		return inWords(timezone).format(at);
	} catch {
		return inWords('UTC').format(at);
	}
}

/** Who a printed report is by: the signed-in person's name, or their e-mail when they gave no name. */
export const authorOf = (user: { name?: string | null; email: string }) => user.name?.trim() || user.email;
