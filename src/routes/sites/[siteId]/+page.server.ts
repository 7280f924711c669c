// Over 60 lines: the site page's six form actions (share, unshare, create, baseline, archive, delete), each
// parsing its form and calling one service.
import { error, fail, redirect } from '@sveltejs/kit';
import { inviteLimiter, TOO_MANY } from '$lib/server/rate-limit';
import { inviteToSite } from '$lib/server/workspaces/invitation';
import { removeSiteGuest, siteGuests } from '$lib/server/workspaces/membership';
import { emailField } from '$lib/forms/auth.schema';
import { z } from 'zod';
import { requireSiteAccess } from '$lib/server/guard';
import { siteTrail } from '$lib/server/workspaces/audit';
import { usableTariff } from '$lib/server/tariffs/usable';
import { changeScenario, createScenario, listScenarios } from '$lib/server/sites/scenario.service';
import { priceScenarios } from '$lib/server/sites/scenario-list';
import { scenarioSchema } from '$lib/forms/site.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { storableText } from '$lib/forms/storable';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site, role, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const year = new Date().getUTCFullYear();
	const rows = await priceScenarios(site, await listScenarios(site.id), year);
	// A tariff the site's workspace may not use is not shown at all, only said to be unavailable.
	const tariff = site.tariffId ? await usableTariff(site.workspaceId, site.tariffId) : null;
	return {
		scenarios: rows,
		year,
		tariff: tariff
			? { id: tariff.tariff.id, name: tariff.tariff.name, utility: tariff.tariff.utility }
			: null,
		tariffUnavailable: !!site.tariffId && !tariff,
		canShare: !viaGrant && role !== 'viewer',
		guests: !viaGrant && role !== 'viewer' ? await siteGuests(site.id) : [],
		trail: (await siteTrail(site.id, 50)).map((e) => ({ ...e, createdAt: e.createdAt.toISOString() }))
	};
}) satisfies PageServerLoad;

const idSchema = z.object({ scenarioId: z.uuid() });

/** Every scenario action: the editor role on this site, a scenario of this site. */
async function scenarioAction(event: Parameters<Actions[string]>[0]) {
	const access = await requireSiteAccess(event, event.params.siteId!, 'editor');
	const form = await event.request.formData();
	const parsed = idSchema.safeParse(Object.fromEntries(form));
	const scenario = parsed.success
		? (await listScenarios(access.site.id)).find((s) => s.id === parsed.data.scenarioId)
		: undefined;
	return { ...access, form, scenario };
}

/** Sharing is for the workspace's own editors: a guest of the site cannot pass it on. */
async function requireSharer(event: Parameters<Actions[string]>[0]) {
	const access = await requireSiteAccess(event, event.params.siteId!, 'editor');
	if (access.viaGrant) error(403, 'Only the workspace that owns this site can share it.');
	return access;
}

const shareSchema = z.object({
	email: emailField,
	role: z.enum(['editor', 'viewer'], { error: 'Pick editor or viewer' })
});

export const actions = {
	share: async (event) => {
		const { site, user } = await requireSharer(event);
		const form = await event.request.formData();
		const parsed = shareSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success)
			return fail(400, { action: 'share', values: keepValues(form), errors: fieldErrors(parsed.error) });
		if (await inviteLimiter.isLimited(event))
			return fail(429, { action: 'share', values: keepValues(form), errors: { email: TOO_MANY } });
		await inviteToSite({ site, invitedBy: user, ...parsed.data }, event.url.origin);
		return { action: 'share', ok: true, shared: parsed.data.email };
	},
	unshare: async (event) => {
		const { site } = await requireSharer(event);
		const parsed = z
			.object({ userId: z.string().min(1).max(100).refine(storableText) })
			.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success)
			return fail(400, { action: 'unshare', errors: { form: 'Pick a person to stop sharing with.' } });
		await removeSiteGuest(site.id, parsed.data.userId);
		return { action: 'unshare', ok: true };
	},
	create: async (event) => {
		const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
		const form = await event.request.formData();
		const parsed = scenarioSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success)
			return fail(400, { action: 'create', values: keepValues(form), errors: fieldErrors(parsed.error) });
		const from = String(form.get('fromId') ?? '');
		const scenarios = await listScenarios(site.id);
		if (from && !scenarios.some((s) => s.id === from))
			return fail(400, {
				action: 'create',
				values: keepValues(form),
				errors: { fromId: 'Pick a scenario of this site' }
			});
		const id = await createScenario(site, parsed.data, from || null, user);
		redirect(303, `/sites/${site.id}/scenarios/${id}`);
	},
	baseline: async (event) => {
		const { site, user, scenario } = await scenarioAction(event);
		if (!scenario || scenario.deletedAt || scenario.archivedAt)
			return fail(400, { action: 'baseline', errors: { form: 'Pick a live scenario of this site.' } });
		await changeScenario(site, scenario, { kind: 'baseline' }, user);
		return { action: 'baseline', ok: true };
	},
	archive: async (event) => {
		const { site, user, scenario, form } = await scenarioAction(event);
		if (!scenario) return fail(400, { action: 'archive', errors: { form: 'Pick a scenario of this site.' } });
		await changeScenario(site, scenario, { kind: form.get('undo') ? 'unarchive' : 'archive' }, user);
		return { action: 'archive', ok: true };
	},
	delete: async (event) => {
		const { site, user, scenario, form } = await scenarioAction(event);
		if (!scenario) return fail(400, { action: 'delete', errors: { form: 'Pick a scenario of this site.' } });
		if (!form.get('undo') && form.get('confirm') !== 'yes')
			return fail(400, { action: 'delete', errors: { form: 'Confirm the deletion.' } });
		await changeScenario(site, scenario, { kind: form.get('undo') ? 'restore' : 'delete' }, user);
		return {
			action: 'delete',
			ok: true,
			undoable: !form.get('undo') ? scenario.id : null,
			name: scenario.name
		};
	}
} satisfies Actions;
