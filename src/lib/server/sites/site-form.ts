import { fail, type RequestEvent } from '@sveltejs/kit';
import { holidaysSchema, timezoneSchema } from '$lib/calc';
import { siteSchema } from '$lib/forms/site.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { revisionOf } from '$lib/forms/storable';
import { waterDraftFrom } from '$lib/components/site-form/tank-form';
import { readWaterDraft } from '$lib/components/site-form/tank-read';
import { tariffChoiceProblem, type TariffChooser } from '../tariffs/usable';
import type { SiteFields } from './site.service';

export { tariffChoices } from '../tariffs/tariff-choices';

/**
 * What a site form sent with its Find button when scripts do not run (a GET to the page itself, the
 * search in `tariffs`): the page shows it again as typed. Null for a plain visit.
 */
export function searchedForm(url: URL): { values: Record<string, string> } | null {
	if (!url.searchParams.has('tariffs') || !url.searchParams.has('name')) return null;
	return { values: Object.fromEntries([...url.searchParams].filter(([key]) => key !== 'revision')) };
}

/**
 * Validates a site form: the shared schema, the water (altitude and tank rows, `tank-read.ts`), then
 * what needs the server's data (time zone, holiday region, tariff). A form that has the altitude box
 * sends the whole water (no tank rows: no tanks); a post without it (an older page) leaves it as stored.
 */
export async function readSiteForm(
	event: RequestEvent,
	chooser: TariffChooser
): Promise<
	{ ok: true; input: SiteFields; revision: number } | { ok: false; failure: ReturnType<typeof fail> }
> {
	const form = await event.request.formData();
	const values = keepValues(form, []);
	const parsed = siteSchema.safeParse(Object.fromEntries(form));
	const water = form.has('altitudeM') ? readWaterDraft(waterDraftFrom(form)) : null;
	const errors = {
		...(parsed.success ? {} : fieldErrors(parsed.error)),
		...(water?.ok === false ? water.errors : {})
	};
	if (!timezoneSchema.safeParse(values.timezone).success)
		errors.timezone ??= 'Time zone must be an IANA name such as America/Chicago';
	if (parsed.success) {
		const holidays = holidaysSchema.safeParse({
			country: parsed.data.country,
			...(parsed.data.region ? { region: parsed.data.region } : {})
		});
		if (!holidays.success)
			errors[parsed.data.region ? 'region' : 'country'] ??= holidays.error.issues[0]!.message;
		// The form's version list belongs to the tariff picked; with none picked, a leftover version means nothing.
		if (!parsed.data.tariffId) parsed.data.tariffVersion = null;
		const tariff = await tariffChoiceProblem(chooser, parsed.data);
		if (tariff) errors[tariff.field] ??= tariff.message;
	}
	if (!parsed.success || water?.ok === false || Object.keys(errors).length)
		return { ok: false, failure: fail(400, { values, errors }) };
	return {
		ok: true,
		input: { ...parsed.data, ...(water?.ok ? { water: water.water } : {}) },
		revision: revisionOf(values.revision ?? 0)
	};
}
