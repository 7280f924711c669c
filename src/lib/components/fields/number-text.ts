/**
 * What a number box writes while it keeps its text: a number when the text is one, nothing when the box
 * is empty (the schema then says "Per kWh is required"), and the text itself when it is not a number
 * (the schema says "Per kWh must be a number"). Never NaN, so the JSON a page posts is what was typed.
 */
export type NumberDraft = number | string | undefined;

const DECIMAL = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/** The draft for a box's text: "0.12" → 0.12, "" → undefined, "12abc" → "12abc". */
export function numberDraft(text: string): NumberDraft {
	const trimmed = text.trim();
	if (trimmed === '') return undefined;
	if (!DECIMAL.test(trimmed)) return trimmed;
	const parsed = Number(trimmed);
	return Number.isFinite(parsed) ? parsed : trimmed;
}

/**
 * What a box that writes numbers only means: a finite number, nothing for an empty box (the schema then
 * says "Watts is required"), or `bad` for text that is not a number — which also writes nothing, never NaN.
 */
export function parseNumber(text: string): { value: number | undefined; bad: boolean } {
	const draft = numberDraft(text);
	return typeof draft === 'string' ? { value: undefined, bad: true } : { value: draft, bad: false };
}

/** What a number box shows for a value it did not type itself (a loaded, replaced or undone value). */
export function numberText(value: unknown): string {
	if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
	return typeof value === 'string' ? value : '';
}

/**
 * The text a box keeps when the value may have changed under it: its own text while that still writes
 * the same value ("0." stays "0." while the value is 0), otherwise the value's text. `written` is what
 * the box writes for a text: the draft, or for a numbers-only box the parsed number.
 */
export function syncedText(
	value: unknown,
	text: string,
	written: (text: string) => unknown = numberDraft
): string {
	const typed = written(text);
	if (typed === value || (typed === undefined && (value === undefined || value === null))) return text;
	return numberText(value);
}
