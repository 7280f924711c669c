/**
 * What a page reads from its action's result (`fail(400, { errors, values })`): the messages by field
 * name and the values to show again. Result shapes differ by action (a sent notice has neither), so
 * these take any result and give an empty record when it has no such part.
 */
export function actionErrors(form: unknown): Record<string, string> {
	return part(form, 'errors');
}

/** The values an action sent back so nothing typed is lost (passwords are never among them). */
export function actionValues(form: unknown): Record<string, string> {
	return part(form, 'values');
}

function part(form: unknown, key: 'errors' | 'values'): Record<string, string> {
	if (form === null || typeof form !== 'object' || !(key in form)) return {};
	return ((form as Record<string, unknown>)[key] ?? {}) as Record<string, string>;
}

/**
 * A form action's result as a component inside the page receives it: its messages and values by field
 * name, plus what that action says on success (`{ invited: string }`); null before any post.
 */
export type ActionState<Success extends object = object> =
	({ errors?: Record<string, string>; values?: Record<string, string> } & Success) | null;
