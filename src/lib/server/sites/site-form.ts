import { fail, type RequestEvent } from '@sveltejs/kit';
import { holidaysSchema, timezoneSchema } from '$lib/calc';
import { siteSchema, type SiteInput } from '$lib/forms/site.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { revisionOf } from '$lib/forms/storable';
import { searchTariffs } from '../services/tariff.service';

/** The tariffs a site of this workspace may use: the public library and the workspace's own. */
export async function tariffChoices(workspaceId: string) {
	const { items } = await searchTariffs([workspaceId], { sort: 'utility', pageSize: 100 });
	return items.map(({ tariff, versions }) => ({
		id: tariff.id,
		label: `${tariff.utility} — ${tariff.name}${tariff.workspaceId ? ' (ours)' : ''}`,
		currency: tariff.currency,
		versions: versions.map((v) => ({ number: v.number, effectiveFrom: v.effectiveFrom }))
	}));
}

/** Validates a site form: the shared schema, then what needs the server's data (time zone, holiday region, tariff). */
export async function readSiteForm(
	event: RequestEvent,
	workspaceId: string
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
		if (parsed.data.tariffId) {
			const tariff = (await tariffChoices(workspaceId)).find((t) => t.id === parsed.data.tariffId);
			if (!tariff) errors.tariffId ??= 'Pick a tariff from the library';
			else if (
				parsed.data.tariffVersion &&
				!tariff.versions.some((v) => v.number === parsed.data.tariffVersion)
			)
				errors.tariffVersion ??= `That tariff has no version ${parsed.data.tariffVersion}`;
		}
	}
	if (!parsed.success || Object.keys(errors).length)
		return { ok: false, failure: fail(400, { values, errors }) };
	return { ok: true, input: parsed.data, revision: revisionOf(values.revision ?? 0) };
}
