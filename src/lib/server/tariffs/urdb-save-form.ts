// The import page's save: the person's choices checked, the submission built and checked, then saved once.
import { parseRequest, type RequestIssue } from '$lib/calc';
import { urdbSaveSchema } from '$lib/forms/urdb-import.schema';
import { tariffSubmissionSchema, todayIso } from './submission';
import { urdbSubmission } from './urdb-provenance';
import { REFUSED, type UrdbReading } from './urdb-read';
import { saveUrdbTariff, type ExistingImport } from './urdb-save';

type Author = { id: string; name: string | null; email: string };
type Refused = {
	status: 400 | 409 | 422;
	data: { errors: Record<string, string>; existing?: ExistingImport; values: Record<string, string> };
};

/** The form field a problem of the built submission belongs to: the person's choices, else the rate. */
function fieldOf(issue: RequestIssue, hasStart: boolean): string {
	if (issue.path === 'meta.timezone') return 'timezone';
	if (issue.path.startsWith('version.effective') && !hasStart) return 'effectiveFrom';
	return 'json';
}

/**
 * Saves a read rate where the caller (already guarded) chose: refused rates never; the time zone, for a
 * rate without a start date the start date, and whether to keep the rate's end date, from the form; everything else from the rate itself,
 * checked by the same schema as every other tariff. The same label already there is answered with a
 * link to it instead of a second copy.
 */
export async function saveImportedRate(
	reading: Exclude<UrdbReading, { kind: 'unreadable' }>,
	form: FormData,
	workspaceId: string | null,
	author: Author
): Promise<{ saved: string } | Refused> {
	const values = {
		timezone: String(form.get('timezone') ?? ''),
		effectiveFrom: String(form.get('effectiveFrom') ?? ''),
		openEnded: form.get('openEnded') === 'on' ? 'on' : ''
	};
	if (reading.kind === 'refused') return { status: 422, data: { errors: { json: REFUSED }, values } };
	const choices = urdbSaveSchema.safeParse(values);
	if (!choices.success) {
		const errors: Record<string, string> = {};
		for (const issue of choices.error.issues) errors[String(issue.path[0] ?? 'form')] ??= issue.message;
		return { status: 400, data: { errors, values } };
	}
	const hasStart = reading.rate.startdate !== undefined;
	const built = urdbSubmission(reading, choices.data, todayIso());
	const parsed = parseRequest(tariffSubmissionSchema, built);
	if (!parsed.success) {
		const errors: Record<string, string> = {};
		for (const issue of parsed.error.issues) errors[fieldOf(issue, hasStart)] ??= issue.message;
		return { status: 400, data: { errors, values } };
	}
	const label = reading.rate.label ?? null;
	const outcome = await saveUrdbTariff(parsed.data, { label, workspaceId }, author);
	if ('saved' in outcome) return outcome;
	const where = workspaceId ? 'this workspace' : 'the public library';
	return {
		status: 409,
		data: {
			errors: { json: `This rate (label ${label}) is already in ${where}: nothing new was saved.` },
			existing: outcome.existing,
			values
		}
	};
}
