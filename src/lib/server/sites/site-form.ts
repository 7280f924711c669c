import { fail, type RequestEvent } from '@sveltejs/kit';
import { holidaysSchema, timezoneSchema } from '$lib/calc';
import { siteSchema, type SiteInput } from '$lib/forms/site.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { revisionOf } from '$lib/forms/storable';
import { tariffChoiceProblem, type TariffChooser } from '../tariffs/usable';

export { tariffChoices } from '../tariffs/usable';

/** Validates a site form: the shared schema, then what needs the server's data (time zone, holiday region, tariff). */
export async function readSiteForm(
	event: RequestEvent,
	chooser: TariffChooser
): Promise<
	{ ok: true; input: SiteInput; revision: number } | { ok: false; failure: ReturnType<typeof fail> }
> {
	const form = await event.request.formData();
	const values = keepValues(form, []);
	const parsed = siteSchema.safeParse(Object.fromEntries(form));
	const errors = parsed.success ? {} : fieldErrors(parsed.error);
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
	if (!parsed.success || Object.keys(errors).length)
		return { ok: false, failure: fail(400, { values, errors }) };
	return { ok: true, input: parsed.data, revision: revisionOf(values.revision ?? 0) };
}
