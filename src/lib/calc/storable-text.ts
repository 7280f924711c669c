/**
 * Text JavaScript holds that PostgreSQL cannot store: U+0000, and a lone half of a UTF-16 surrogate
 * pair (JSON can spell one, `"\uD800"`; no browser form sends one). jsonb refuses both with an error
 * (a 500 if it reaches the database); a text column would silently store U+FFFD instead of the lone
 * half. Every stored text field refuses them beside the field.
 */

/** A high surrogate not followed by a low one, or a low one not preceded by a high one. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const NUL_MESSAGE = 'Remove the invisible control character (U+0000).';
export const SURROGATE_MESSAGE =
	'Remove the broken character: half of an emoji or other symbol (U+D800 to U+DFFF) that cannot be saved.';

/** True when the text holds neither U+0000 nor a lone surrogate. */
export const storableText = (text: string) => !text.includes('\u0000') && !LONE_SURROGATE.test(text);

/** Why `text` cannot be stored, in words; null when it can. */
export function unstorableMessage(text: string): string | null {
	if (text.includes('\u0000')) return NUL_MESSAGE;
	return LONE_SURROGATE.test(text) ? SURROGATE_MESSAGE : null;
}

/** Zod's error option for `.refine(storableText, UNSTORABLE)`: the message that fits the character found. */
export const UNSTORABLE = {
	error: (issue: { input?: unknown }) =>
		(typeof issue.input === 'string' && unstorableMessage(issue.input)) || SURROGATE_MESSAGE
};
