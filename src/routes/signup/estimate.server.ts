import { parseRequest } from '$lib/calc';
import { figure, money, moneyPerKwh } from '$lib/text/numbers';
import { keptEstimateSchema, type KeptEstimate } from '$lib/server/accounts/kept-estimate';
import { toEquipment, unitWattsOf } from '../quick-estimate';
import { carriesEstimate, entriesFromQuery, entriesToQuery } from '../quick-estimate-url';

/*
 * The quick estimate a sign-up carries: it comes in the sign-up page's address ("Keep it as a site" on
 * the home page), is shown on the page in words, and is checked and kept with the sign-up when the form
 * is sent (the form posts to the same address).
 */

/** The estimate in the address, as the sign-up page shows it; null when the address carries none. */
export function estimateOffer(url: URL) {
	if (!carriesEstimate(url.searchParams)) return null;
	const entries = entriesFromQuery(url.searchParams);
	const devices = entries.devices.map((d) => {
		const watts = unitWattsOf(d);
		const runs = d.runMode === 'always' ? 'always on' : `${figure(d.hoursPerDay ?? 0, 2)} hours a day`;
		return `${d.quantity ?? '?'} × ${d.name || 'Device'}, ${watts === null ? '?' : figure(watts, 1)} W each, ${runs}`;
	});
	const rate =
		entries.rateMode === 'library'
			? 'the library tariff you chose'
			: `a flat price of ${moneyPerKwh(entries.perKwh ?? 0, 'USD')} per kWh` +
				(entries.perMonth ? ` and ${money(entries.perMonth, 'USD')} a month` : '');
	return {
		devices,
		rate,
		backTo: `/?${entriesToQuery(entries)}`,
		country: /^[A-Z]{2}$/.test(url.searchParams.get('country') ?? '')
			? url.searchParams.get('country')!
			: 'US',
		timezone: url.searchParams.get('tz') ?? 'UTC'
	};
}

/** Where each problem shows: the site's name and country on this page, anything else above the form. */
const ON_THIS_PAGE = new Set(['siteName', 'country']);

/**
 * The estimate to keep with the sign-up, from the address and the page's two site fields, checked with
 * the core's schemas; or the messages, by field, when it cannot be kept as it is.
 */
export function keptEstimateFrom(
	url: URL,
	form: FormData
): { estimate: KeptEstimate | null; errors: Record<string, string> } {
	if (!carriesEstimate(url.searchParams)) return { estimate: null, errors: {} };
	const entries = entriesFromQuery(url.searchParams);
	const parsed = parseRequest(keptEstimateSchema, {
		siteName: String(form.get('siteName') ?? ''),
		country: String(form.get('country') ?? ''),
		timezone: url.searchParams.get('tz') ?? 'UTC',
		devices: toEquipment(entries.devices),
		rate:
			entries.rateMode === 'library'
				? { kind: 'library', tariffId: entries.tariffId }
				: { kind: 'flat', perKwh: entries.perKwh, perMonth: entries.perMonth ?? 0 }
	});
	if (parsed.success) return { estimate: parsed.data, errors: {} };
	const errors: Record<string, string> = {};
	for (const { path, message } of parsed.error.issues) {
		const field = ON_THIS_PAGE.has(path) ? path : 'estimate';
		errors[field] ??= message;
	}
	return { estimate: null, errors };
}
