import { fail, redirect } from '@sveltejs/kit';
import { requireAdmin } from '$lib/server/guard';
import { uploadForm } from '$lib/server/http/upload-form';
import { SECTORS } from '$lib/server/tariffs/bulk/bulk-options';
import { startBulkImport } from '$lib/server/tariffs/bulk/bulk-start';
import { MAX_FILE_BYTES, PART_BYTES } from '$lib/server/tariffs/bulk/bulk-upload';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	requireAdmin(event);
	return {
		sectors: [...SECTORS],
		partBytes: PART_BYTES,
		maxMb: Math.floor(MAX_FILE_BYTES / 1024 / 1024)
	};
}) satisfies PageServerLoad;

export const actions = {
	start: async (event) => {
		const author = requireAdmin(event);
		const form = await uploadForm(event.request);
		const empty = { sectors: [], utilityContains: '', timezone: '' };
		if (form === 'too-large')
			return fail(413, {
				values: empty,
				errors: { file: 'Without scripts the page sends at most 10 MB; turn scripts on for a bigger file.' }
			});
		const started = await startBulkImport(form, author);
		if (!started.ok) return fail(started.status, { values: started.values, errors: started.errors });
		redirect(303, `/admin/urdb-import/${started.jobId}`);
	}
} satisfies Actions;
