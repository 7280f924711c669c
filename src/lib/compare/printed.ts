import { DateTime } from 'luxon';

/**
 * A date in words in a site's time zone, as a printed report states it: "3 December 2026". A report
 * printed late in the evening at the site says the site's day, not the server's.
 */
export function dateInWords(iso: string, timezone: string): string {
	const at = DateTime.fromISO(iso, { zone: 'utc' }).setZone(timezone);
	return (at.isValid ? at : DateTime.fromISO(iso, { zone: 'utc' })).toFormat('d MMMM yyyy', {
		locale: 'en-GB'
	});
}

/** Who a printed report is by: the signed-in person's name, or their e-mail when they gave no name. */
export const authorOf = (user: { name?: string | null; email: string }) => user.name?.trim() || user.email;
