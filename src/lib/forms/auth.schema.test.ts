import { describe, expect, it } from 'vitest';
import { signUpSchema } from './auth.schema';
import { fieldErrors, keepValues } from './errors';

/** A sign-up form that passes, with these fields changed. */
const signUp = (changes: Record<string, string> = {}) => ({
	name: 'A',
	email: 'a@example.org',
	password: 'x'.repeat(10),
	confirm: 'x'.repeat(10),
	...changes
});

describe('the sign-up form', () => {
	it('normalises the address and accepts a long enough password', () => {
		const parsed = signUpSchema.parse(signUp({ name: ' Ana ', email: ' Ana@Example.ORG ' }));
		expect(parsed.email).toBe('ana@example.org');
		expect(parsed.name).toBe('Ana');
	});

	it('ties each problem to its field', () => {
		const result = signUpSchema.safeParse({ name: '', email: 'nope', password: 'short', confirm: 'other' });
		expect(result.success).toBe(false);
		const errors = fieldErrors(result.error!);
		expect(errors).toMatchObject({
			name: 'Enter your name.',
			email: 'Enter an e-mail address like name@example.org.',
			password: 'Use at least 10 characters.'
		});
	});

	it('reports differing passwords at the second field', () => {
		const result = signUpSchema.safeParse(signUp({ confirm: 'y'.repeat(10) }));
		expect(fieldErrors(result.error!)).toEqual({ confirm: 'The two passwords differ.' });
	});

	it('keeps what was typed except the passwords', () => {
		const form = new FormData();
		form.set('name', 'Ana');
		form.set('password', 'secret secret');
		expect(keepValues(form)).toEqual({ name: 'Ana' });
	});
});
