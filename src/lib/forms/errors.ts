import type { z } from 'zod';

export type FieldErrors = Record<string, string>;

/** The first message per field, keyed by the dotted path, for showing beside each input. */
export function fieldErrors(error: z.ZodError): FieldErrors {
	const out: FieldErrors = {};
	for (const issue of error.issues) {
		const key = issue.path.join('.') || 'form';
		out[key] ??= issue.message;
	}
	return out;
}

/** Form values to send back on an error, so nothing typed is lost; passwords are never echoed. */
export function keepValues(form: FormData, omit: string[] = ['password', 'confirm']): Record<string, string> {
	const out: Record<string, string> = {};
	for (const [key, value] of form) if (typeof value === 'string' && !omit.includes(key)) out[key] = value;
	return out;
}
