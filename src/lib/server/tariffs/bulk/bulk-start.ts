import { bulkImportJob } from './bulk-job';
import { bulkFiltersSchema, filtersFromForm, type BulkFilters } from './bulk-options';
import type { Author } from './bulk-save';
import {
	dropUpload,
	isUploadId,
	MAX_FILE_BYTES,
	MAX_PARTS,
	PART_BYTES,
	partSizes,
	putPart
} from './bulk-upload';

/**
 * Starts a bulk import from the admin page's form: the filters chosen before import, and the file,
 * either already stored in parts by the page's script (`uploadId`, `parts`) or, without scripts, the
 * form's own file field (a small file: the server takes no body over 11 MB). Nothing is queued unless
 * every field is right and every part of the file is in the store.
 */

export type StartValues = { sectors: string[]; utilityContains: string; timezone: string };
export type StartOutcome =
	| { ok: true; jobId: string }
	| { ok: false; status: 400 | 503; errors: Record<string, string>; values: StartValues };

const CHOOSE = 'Choose a JSON file of rates from the open rate database.';

const text = (form: FormData, name: string) => {
	const value = form.get(name);
	return typeof value === 'string' ? value : '';
};

/** The file's name as the report shows it: printable, at most 200 characters. */
const fileNameOf = (name: string) =>
	// eslint-disable-next-line no-control-regex
	name.replace(/[\u0000-\u001f\u007f\ud800-\udfff]/g, '').slice(0, 200) || 'rates.json';

/** The file as stored parts: the script's upload checked part by part, or the form's file stored now. */
async function storedFile(
	form: FormData
): Promise<{ uploadId: string; parts: number; bytes: number; fileName: string } | { error: string }> {
	const file = form.get('file');
	if (file instanceof File && file.size > 0) {
		const uploadId = crypto.randomUUID();
		const parts = Math.ceil(file.size / PART_BYTES);
		for (let part = 0; part < parts; part += 1)
			await putPart(
				uploadId,
				part,
				new Uint8Array(await file.slice(part * PART_BYTES, (part + 1) * PART_BYTES).arrayBuffer())
			);
		return { uploadId, parts, bytes: file.size, fileName: fileNameOf(file.name) };
	}
	const uploadId = text(form, 'uploadId');
	const parts = Number(text(form, 'parts'));
	if (!uploadId && !text(form, 'parts')) return { error: CHOOSE };
	if (!isUploadId(uploadId) || !Number.isInteger(parts) || parts < 1 || parts > MAX_PARTS)
		return { error: `The upload did not arrive whole. ${CHOOSE}` };
	const sizes = await partSizes(uploadId, parts);
	if (!Array.isArray(sizes))
		return {
			error: `The upload is incomplete: part ${sizes.missing} of ${parts} did not arrive. Choose the file again.`
		};
	const bytes = sizes.reduce((sum, size) => sum + size, 0);
	if (bytes === 0) return { error: 'The file is empty.' };
	if (bytes > MAX_FILE_BYTES) return { error: `The file is over ${MAX_FILE_BYTES / 1024 / 1024} MB.` };
	return { uploadId, parts, bytes, fileName: fileNameOf(text(form, 'fileName')) };
}

export async function startBulkImport(form: FormData, author: Author): Promise<StartOutcome> {
	const raw = filtersFromForm(form);
	const values: StartValues = {
		sectors: raw.sectors.slice(0, 10).map((s) => s.slice(0, 40)),
		utilityContains: raw.utilityContains.slice(0, 200),
		timezone: raw.timezone.slice(0, 64)
	};
	const errors: Record<string, string> = {};
	const filters = bulkFiltersSchema.safeParse(raw);
	if (!filters.success)
		for (const issue of filters.error.issues) {
			const field = String(issue.path[0] ?? 'form');
			errors[field] ??= issue.message;
		}
	if (Object.keys(errors).length) {
		// The page sent the file before the form: its parts go, and the next try sends it again.
		const uploadId = text(form, 'uploadId');
		const parts = Number(text(form, 'parts'));
		if (isUploadId(uploadId) && Number.isInteger(parts) && parts >= 1 && parts <= MAX_PARTS)
			await dropUpload(uploadId, parts);
		return { ok: false, status: 400, errors, values };
	}
	const stored = await storedFile(form);
	if ('error' in stored) return { ok: false, status: 400, errors: { file: stored.error }, values };
	const data = { ...stored, filters: filters.data as BulkFilters, author };
	const jobId = await bulkImportJob.send(data);
	if (!jobId)
		return {
			ok: false,
			status: 503,
			errors: { form: 'The job queue did not take the import; try again.' },
			values
		};
	return { ok: true, jobId };
}
