import { z } from 'zod';
import {
	emailField,
	nameField,
	newPasswordField,
	roleField,
	workspaceNameField
} from '$lib/forms/auth.schema';
import { storableText, UNSTORABLE } from '$lib/forms/storable';

/*
 * The workspace page's and the invitation page's forms, checked on the server only (the page's components post plain forms and show
 * the field messages that come back).
 */

/** Naming a workspace: creating one, or renaming it. */
export const workspaceNameSchema = z.object({ name: workspaceNameField });

/** Inviting someone by e-mail, with the role they will have. */
export const inviteSchema = z.object({ email: emailField, role: roleField });

const userIdField = z.string().min(1).max(100).refine(storableText, UNSTORABLE);

/** Giving a member another role. */
export const changeRoleSchema = z.object({ userId: userIdField, role: roleField });

/** Removing a member. */
export const memberSchema = z.object({ userId: userIdField });

/** Withdrawing an invitation. */
export const invitationSchema = z.object({ invitationId: z.uuid() });

/** Joining through an invitation without an account: a name and a new password, typed twice. */
export const joinSchema = z
	.object({ name: nameField, password: newPasswordField, confirm: z.string() })
	.refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
