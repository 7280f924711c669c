// A note on an imported rate as the page prints it: the field named once.

/** A note of the import: the rate's field it is about and the message in words. */
export type Note = { field: string; message: string };

const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * The field to print before the message, or none when the message already names it as a word: the
 * core's messages keep their field (the admin's bulk report lists them without one), so "energycomments
 * is not priced by Runrate" is printed alone, not after "energycomments:".
 */
export function noteText(note: Note): { field: string | null; message: string } {
	const named = note.field !== '' && new RegExp(`(^|\\W)${escaped(note.field)}(\\W|$)`).test(note.message);
	return { field: note.field && !named ? note.field : null, message: note.message };
}
