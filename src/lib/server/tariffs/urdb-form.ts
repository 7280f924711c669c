// The import page's rate: pasted JSON or an uploaded .json file, read and converted on the server.
import { fail, type RequestEvent } from '@sveltejs/kit';
import type { UrdbPreview } from '$lib/forms/urdb-import.schema';
import { calculationBudgetSpent } from '../http/rate-limits';
import { uploadForm } from '../http/upload-form';
import { TOO_MANY } from '../rate-limit';
import { customerClassOf, dateOf } from './urdb-provenance';
import { MAX_URDB_BYTES, readUrdbRate, type UrdbReading } from './urdb-read';

const MB = MAX_URDB_BYTES / 1024 / 1024;

/** A problem with the text or file, for the field it belongs to, and the problems inside the rate. */
export type FormProblem = { field: 'json' | 'file'; message: string; issues: string[]; status: 400 | 413 };

/** The rate's JSON text: the chosen file if there is one (up to 2 MB, .json), else the pasted text. */
export async function rateText(
	form: FormData
): Promise<{ text: string; field: 'json' | 'file' } | FormProblem> {
	const file = form.get('file');
	if (file instanceof File && file.size > 0) {
		if (file.size > MAX_URDB_BYTES)
			return { field: 'file', message: `The file is over ${MB} MB.`, issues: [], status: 413 };
		if (!/\.json$/i.test(file.name))
			return { field: 'file', message: 'The file must end in .json.', issues: [], status: 400 };
		return { text: await file.text(), field: 'file' };
	}
	const pasted = form.get('json');
	const text = typeof pasted === 'string' ? pasted.trim() : '';
	if (!text)
		return {
			field: 'json',
			message: 'Paste the rate’s JSON, or choose a .json file.',
			issues: [],
			status: 400
		};
	if (Buffer.byteLength(text) > MAX_URDB_BYTES)
		return { field: 'json', message: `The text is over ${MB} MB.`, issues: [], status: 413 };
	return { text, field: 'json' };
}

/** Parses and reads the text; the field named for any problem is the one the text came from. */
function readRateText(
	text: string,
	field: 'json' | 'file'
): Exclude<UrdbReading, { kind: 'unreadable' }> | FormProblem {
	let body: unknown;
	try {
		body = JSON.parse(text);
	} catch {
		return {
			field,
			message: 'This is not valid JSON. Copy the whole answer of the database, from { to }.',
			issues: [],
			status: 400
		};
	}
	const reading = readUrdbRate(body);
	if (reading.kind === 'unreadable')
		return {
			field,
			message: reading.message,
			issues: reading.issues.map((issue) => issue.message),
			status: 400
		};
	return reading;
}

/**
 * The posted rate, read: its text (the file's, when one was chosen, so the page can show and post it
 * again) with the reading, or the problem keyed by the field it belongs to.
 */
export async function postedRate(
	form: FormData
): Promise<
	{ json: string; reading: Exclude<UrdbReading, { kind: 'unreadable' }> } | (FormProblem & { json: string })
> {
	const text = await rateText(form);
	if ('message' in text) return { ...text, json: String(form.get('json') ?? '') };
	const reading = readRateText(text.text, text.field);
	if ('message' in reading) return { ...reading, json: text.text };
	return { json: text.text, reading };
}

/** The page's view of a converted or refused rate (plain data, nothing of the raw rate beyond this). */
export function previewOf(reading: Exclude<UrdbReading, { kind: 'unreadable' }>): UrdbPreview {
	const { rate } = reading;
	return {
		kind: reading.kind,
		tariff: reading.kind === 'converted' ? reading.tariff : null,
		notes: reading.notes,
		provenance: {
			utility: reading.meta.utility,
			name: reading.meta.name,
			sector: reading.meta.sector,
			customerClass: customerClassOf(reading.meta.sector),
			startDate: dateOf(rate.startdate),
			endDate: dateOf(rate.enddate),
			label: reading.meta.label,
			uri: typeof rate.uri === 'string' ? rate.uri : null,
			source: reading.meta.source
		}
	};
}

/** The posted form, within the caller's budget (the calculation API's) and the size limit. */
export async function postedForm(event: RequestEvent) {
	if (await calculationBudgetSpent(event)) return fail(429, { errors: { form: TOO_MANY } });
	const form = await uploadForm(event.request);
	if (form === 'too-large') return fail(413, { errors: { file: `The file is over ${MB} MB.` } });
	return form;
}

/** Every post reads the rate again from the form (pasted or uploaded): the preview is never trusted. */
export async function readRate(form: FormData) {
	const posted = await postedRate(form);
	if ('message' in posted)
		return fail(posted.status, {
			json: posted.json,
			errors: { [posted.field]: posted.message },
			issues: posted.issues
		});
	return posted;
}
