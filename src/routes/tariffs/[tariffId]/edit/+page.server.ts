import { fail } from '@sveltejs/kit';
import { requireTariffWrite } from '$lib/server/guard';
import { tariffFormAction } from '$lib/server/tariffs/form-action';
import { jsonField, MAX_REVISION, unstorableIn } from '$lib/forms/storable';
import type { Actions, PageServerLoad } from './$types';
import { tariffMeta, tariffScope } from '$lib/server/tariffs/tariff-view';

export const load = (async (event) => {
	const { tariff, versions } = await requireTariffWrite(event, event.params.tariffId);
	const latest = versions.at(-1)!;
	return {
		tariff: {
			id: tariff.id,
			name: tariff.name,
			utility: tariff.utility,
			revision: tariff.revision,
			scope: tariffScope(tariff).scope
		},
		meta: tariffMeta(tariff),
		latest: {
			number: latest.number,
			effectiveFrom: latest.effectiveFrom,
			source: latest.source,
			structure: latest.structure
		}
	};
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		// What the core's schema lets through but PostgreSQL refuses: U+0000 in a label (jsonb), and a
		// revision past its integer column.
		const submitted = jsonField((await event.request.clone().formData()).get('payload'));
		const unstorable = unstorableIn(submitted);
		if (unstorable) return fail(400, { issues: [unstorable] });
		const revision = (submitted as { expectedRevision?: unknown } | undefined)?.expectedRevision;
		if (Number.isInteger(revision) && Number(revision) > MAX_REVISION)
			return fail(400, {
				issues: [{ path: 'expectedRevision', message: 'Send the revision you edited (expectedRevision)' }]
			});
		return tariffFormAction(event, { tariffId: event.params.tariffId });
	}
} satisfies Actions;
