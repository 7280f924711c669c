// The scenario page's details form: its fields read into the same checks the API uses, with each
// message keyed by the field it belongs to and everything typed kept for the form to show again.
import { z } from 'zod';
import { numberDraft } from '$lib/components/fields/number-text';
import {
	descriptionSchema,
	nameSchema,
	oneOffCostsSchema,
	statusSchema,
	type ScenarioDetails
} from './scenario-details.schema';
import type { ScenarioRow } from './scenario.service';

/** One one-off cost as typed: the amount still text, so "12a" comes back as typed. */
export type OneOffDraft = { label: string; amount: string; note: string };

/** What the form sent, as text, to show again after a refusal. */
export type DetailsValues = {
	name: string;
	description: string;
	status: string;
	tariffId: string;
	oneOffCosts: OneOffDraft[];
};

const ROW = /^oneOffCosts\.(\d{1,2})\.(label|amount|note)$/;

const formSchema = z.object({
	name: nameSchema,
	description: descriptionSchema,
	status: statusSchema,
	tariffId: z.string(),
	oneOffCosts: oneOffCostsSchema
});

/** The rows of one-off costs, in the order of their numbers; a row left wholly blank is dropped. */
function draftRows(form: FormData): OneOffDraft[] {
	const rows = new Map<number, OneOffDraft>();
	for (const [key, value] of form) {
		const match = ROW.exec(key);
		if (!match || typeof value !== 'string') continue;
		const row = rows.get(Number(match[1])) ?? { label: '', amount: '', note: '' };
		row[match[2] as keyof OneOffDraft] = value;
		rows.set(Number(match[1]), row);
	}
	return [...rows.entries()]
		.sort(([a], [b]) => a - b)
		.map(([, row]) => row)
		.filter((row) => row.label.trim() || row.amount.trim() || row.note.trim());
}

/** "2,500" and "$ 2500" are what people type for money; the separators and the sign are not the amount. */
const amountDraft = (text: string) => numberDraft(text.replace(/[,\s$€£]/g, ''));

const text = (form: FormData, name: string) => {
	const value = form.get(name);
	return typeof value === 'string' ? value : '';
};

/**
 * Reads the details form: the details to save with the revision the page loaded, or the messages by field
 * name ("oneOffCosts.0.amount") with the values as typed. The tariff box's empty choice is the site's
 * tariff; keeping the scenario's tariff keeps its pinned version.
 */
export function readDetailsForm(
	form: FormData,
	scenario: Pick<ScenarioRow, 'tariffId' | 'tariffVersion'>
):
	| { ok: true; details: Required<ScenarioDetails>; revision: number; values: DetailsValues }
	| { ok: false; errors: Record<string, string>; values: DetailsValues } {
	const values: DetailsValues = {
		name: text(form, 'name'),
		description: text(form, 'description'),
		status: text(form, 'status'),
		tariffId: text(form, 'tariffId'),
		oneOffCosts: draftRows(form)
	};
	const parsed = formSchema.safeParse({
		...values,
		oneOffCosts: values.oneOffCosts.map((row) => ({
			label: row.label,
			amount: amountDraft(row.amount),
			...(row.note.trim() ? { note: row.note } : {})
		}))
	});
	const revision = Number(text(form, 'revision'));
	if (!parsed.success) {
		const errors: Record<string, string> = {};
		for (const issue of parsed.error.issues) errors[issue.path.join('.')] ??= issue.message;
		return { ok: false, errors, values };
	}
	const { tariffId, ...rest } = parsed.data;
	const tariff = tariffId
		? { tariffId, tariffVersion: tariffId === scenario.tariffId ? scenario.tariffVersion : null }
		: null;
	return {
		ok: true,
		details: { ...rest, tariff },
		revision: Number.isInteger(revision) ? revision : -1,
		values
	};
}

/**
 * What the details form sent with its Find button when scripts do not run (a GET to the page itself, the
 * search in `tariffs`), read as a post would be, so the page shows it again as typed. Null for a plain visit.
 */
export function searchedDetails(
	url: URL,
	scenario: Pick<ScenarioRow, 'tariffId' | 'tariffVersion'>
): DetailsValues | null {
	if (!url.searchParams.has('tariffs') || !url.searchParams.has('name')) return null;
	const form = new FormData();
	for (const [key, value] of url.searchParams) form.append(key, value);
	return readDetailsForm(form, scenario).values;
}
