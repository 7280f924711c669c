import { z } from 'zod';
import { storableText, UNSTORABLE } from './storable';

// Shared by the forms and the server: the same rules give the same messages in both places.

export const emailField = z
	.string({ error: 'Enter your e-mail address.' })
	.trim()
	.toLowerCase()
	.min(1, 'Enter your e-mail address.')
	.max(254, 'That address is too long.')
	.pipe(z.email({ error: 'Enter an e-mail address like name@example.org.' }));

export const newPasswordField = z
	.string({ error: 'Choose a password.' })
	.min(10, 'Use at least 10 characters.')
	.max(200, 'Use at most 200 characters.');

export const signInSchema = z.object({
	email: emailField,
	password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(200)
});

export const magicLinkSchema = z.object({ email: emailField });

export const nameField = z
	.string({ error: 'Enter your name.' })
	.trim()
	.min(1, 'Enter your name.')
	.max(100, 'Use at most 100 characters.')
	.refine(storableText, UNSTORABLE);

export const signUpSchema = z
	.object({ name: nameField, email: emailField, password: newPasswordField, confirm: z.string() })
	.refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });

export const resetSchema = z
	.object({ token: z.string().min(10).max(200), password: newPasswordField, confirm: z.string() })
	.refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });

/** Confirming a sign-up: its link's token and the password chosen in that sign-up (account.service.ts). */
export const confirmSignUpSchema = z.object({
	token: z.string().min(10).max(200),
	password: z
		.string({ error: 'Type the password you chose when you signed up.' })
		.min(1, 'Type the password you chose when you signed up.')
		.max(200, 'That is not the password chosen for this sign-up.')
});

export const workspaceNameField = z
	.string({ error: 'Name the workspace.' })
	.trim()
	.min(2, 'Use at least 2 characters.')
	.max(80, 'Use at most 80 characters.')
	.refine(storableText, UNSTORABLE);

export const roleField = z.enum(['owner', 'editor', 'viewer'], { error: 'Pick owner, editor or viewer.' });
