// Over 60 lines: eight named actions of one page; each only parses, calls a workspaces/ service and shapes the answer.
import { fail, redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/guard';
import { recentNotices } from '$lib/server/tariffs/tariff-notice.service';
import { inviteLimiter, TOO_MANY } from '$lib/server/rate-limit';
import { confirmsWorkspaceName, renameWorkspace } from '$lib/server/workspaces/workspace.service';
import { invite, listPendingInvitations, revokeInvitation } from '$lib/server/workspaces/invitation';
import {
	changeRole,
	listMembers,
	MembershipRuleError,
	removeMember
} from '$lib/server/workspaces/membership';
import { deletionDate, restoreWorkspace, scheduleWorkspaceDeletion } from '$lib/server/workspaces/deletion';
import {
	changeRoleSchema,
	invitationSchema,
	inviteSchema,
	memberSchema,
	workspaceNameSchema
} from '$lib/server/workspaces/workspace.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	const deleteAfter = await deletionDate(workspace.id);
	return {
		deleteAfter: deleteAfter?.toISOString() ?? null,
		members: await listMembers(workspace.id),
		invitations: role === 'owner' ? await listPendingInvitations(workspace.id) : [],
		notices: await recentNotices(workspace.id)
	};
}) satisfies PageServerLoad;

/** Runs a membership change and turns the owner rule into a message on the form. */
async function guarded(action: string, run: () => Promise<void>) {
	try {
		await run();
		return { action, ok: true };
	} catch (error) {
		if (error instanceof MembershipRuleError) return fail(409, { action, errors: { form: error.message } });
		throw error;
	}
}

export const actions = {
	rename: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		const form = await event.request.formData();
		const parsed = workspaceNameSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success)
			return fail(400, { action: 'rename', values: keepValues(form), errors: fieldErrors(parsed.error) });
		await renameWorkspace(workspace.id, parsed.data.name);
		return { action: 'rename', ok: true };
	},

	invite: async (event) => {
		const { workspace, user } = await requireRole(event, event.params.workspaceId, 'owner');
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = inviteSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { action: 'invite', values, errors: fieldErrors(parsed.error) });
		if (await inviteLimiter.isLimited(event))
			return fail(429, { action: 'invite', values, errors: { form: TOO_MANY } });
		const result = await invite(
			{ workspaceId: workspace.id, workspaceName: workspace.name, invitedBy: user, ...parsed.data },
			event.url.origin
		);
		if (result === 'member')
			return fail(409, { action: 'invite', values, errors: { email: 'This person is already a member.' } });
		return { action: 'invite', ok: true, invited: parsed.data.email };
	},

	changeRole: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		const parsed = changeRoleSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { action: 'changeRole', errors: fieldErrors(parsed.error) });
		return guarded('changeRole', () => changeRole(workspace.id, parsed.data.userId, parsed.data.role));
	},

	remove: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		const parsed = memberSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { action: 'remove', errors: fieldErrors(parsed.error) });
		return guarded('remove', () => removeMember(workspace.id, parsed.data.userId));
	},

	revoke: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		const parsed = invitationSchema.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { action: 'revoke', errors: fieldErrors(parsed.error) });
		await revokeInvitation(workspace.id, parsed.data.invitationId);
		return { action: 'revoke', ok: true };
	},

	leave: async (event) => {
		const { workspace, user } = await requireRole(event, event.params.workspaceId, 'viewer');
		const result = await guarded('leave', () => removeMember(workspace.id, user.id));
		if ('ok' in result) redirect(303, '/workspaces');
		return result;
	},

	delete: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		const form = await event.request.formData();
		if (!confirmsWorkspaceName(form.get('confirmName'), workspace.name))
			return fail(400, {
				action: 'delete',
				values: keepValues(form),
				errors: { confirmName: 'Type the workspace name exactly to confirm.' }
			});
		await scheduleWorkspaceDeletion(workspace.id);
		return { action: 'delete', ok: true };
	},

	restore: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
		await restoreWorkspace(workspace.id);
		return { action: 'restore', ok: true };
	}
} satisfies Actions;
