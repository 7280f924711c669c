import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/guard';
import { createWorkspace, listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { workspaceNameField } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const user = requireUser(event);
	return { workspaces: await listWorkspacesFor(user.id) };
}) satisfies PageServerLoad;

const createSchema = z.object({ name: workspaceNameField });

export const actions = {
	create: async (event) => {
		const user = requireUser(event);
		const form = await event.request.formData();
		const parsed = createSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { values: keepValues(form), errors: fieldErrors(parsed.error) });
		const id = await createWorkspace(parsed.data.name, user.id);
		redirect(303, `/w/${id}`);
	}
} satisfies Actions;
