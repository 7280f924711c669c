import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { can, requireRole, requireTariffRead } from '$lib/server/guard';
import { copyTariff, workspaceIdsOf } from '$lib/server/tariffs/tariff.service';
import { tariffUsage } from '$lib/server/sites/site.service';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { features, todayIso, typicalMonth, versionForToday } from '$lib/server/tariffs/submission';
import type { Actions, PageServerLoad } from './$types';
import { tariffMeta, tariffScope } from '$lib/server/tariffs/tariff-view';
import { noticeAudience } from '$lib/server/tariffs/notice-audience';

/**
 * After saving (`?published=N`, the editor's redirect), what the editor is told: a public version is
 * published and its notices go to the owners and editors of the workspaces billed on it; a workspace's
 * own tariff is saved, private, and tells nobody.
 */
async function savedNote(
	tariff: { id: string; workspaceId: string | null },
	versions: readonly { number: number }[],
	param: string | null
) {
	const number = Number(param);
	if (!param || !versions.some((v) => v.number === number)) return null;
	if (tariff.workspaceId !== null) return `Version ${number} is saved, private to your workspace.`;
	if (number === 1) return 'Version 1 is published in the public library.';
	const { people, workspaces } = await noticeAudience(tariff.id);
	if (people === 0)
		return `Version ${number} is published. No workspace has a site billed on this tariff, so nobody was e-mailed.`;
	const who = `${people} ${people === 1 ? 'person' : 'people'} in ${workspaces} ${workspaces === 1 ? 'workspace' : 'workspaces'}`;
	return `Version ${number} is published. ${who} ${people === 1 ? 'was' : 'were'} told by e-mail (the owners and editors of workspaces with a site billed on this tariff).`;
}

export const load = (async (event) => {
	const { tariff, versions, role } = await requireTariffRead(event, event.params.tariffId);
	const user = event.locals.user;
	const canEdit = tariff.workspaceId ? !!role && can(role, 'editor') : !!user?.isAdmin;
	// "Make our copy" is for a tariff the workspace does not own already.
	const copyTargets = user
		? (await listWorkspacesFor(user.id)).filter((w) => w.role !== 'viewer' && w.id !== tariff.workspaceId)
		: [];
	const today = todayIso();
	const current = versionForToday(versions, today);
	return {
		tariff: { id: tariff.id, ...tariffMeta(tariff), ...tariffScope(tariff) },
		today,
		current: current
			? { number: current.number, effectiveFrom: current.effectiveFrom, year: Number(today.slice(0, 4)) }
			: null,
		versions: versions
			.map((v) => ({
				id: v.id,
				number: v.number,
				effectiveFrom: v.effectiveFrom,
				effectiveTo: v.effectiveTo,
				source: v.source,
				checkedOn: v.checkedOn,
				changeNote: v.changeNote,
				publishedBy: v.publishedByName,
				publishedAt: v.publishedAt,
				structure: v.structure
			}))
			.reverse(),
		typicalMonth: typicalMonth(tariff, current),
		features: current ? features(current.structure) : null,
		canEdit,
		savedNote: canEdit ? await savedNote(tariff, versions, event.url.searchParams.get('published')) : null,
		copyTargets: copyTargets.map((w) => ({ id: w.id, name: w.name })),
		usage: await tariffUsage(tariff.id, await workspaceIdsOf(user?.id))
	};
}) satisfies PageServerLoad;

export const actions = {
	copy: async (event) => {
		const { tariff } = await requireTariffRead(event, event.params.tariffId);
		const parsed = z
			.object({ workspaceId: z.uuid({ error: 'Pick a workspace' }) })
			.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { errors: { workspaceId: 'Pick a workspace to copy it into.' } });
		const { user } = await requireRole(event, parsed.data.workspaceId, 'editor');
		const id = await copyTariff(tariff.id, parsed.data.workspaceId, user);
		redirect(303, `/tariffs/${id}`);
	}
} satisfies Actions;
