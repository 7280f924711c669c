import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { roleAtLeast, type Role } from './db/schema';
import { findTariff } from './tariffs/tariff.service';
import { findScenario } from './sites/scenario.service';
import { findSite, type SiteRow } from './sites/site.service';
import { findMembership, memberRole, siteGrantRole } from './workspaces/membership';

/*
 * The guard depends on the services and never the reverse: the role type and its rank order live with the
 * schema (db/schema/workspace.ts), the membership lookups in workspaces/membership.ts.
 */
export type { Role };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type WorkspaceAccess = { user: SessionUser; workspace: { id: string; name: string }; role: Role };

const isApi = (event: RequestEvent) => event.url.pathname.startsWith('/api/');

/** The signed-in user, or a redirect to sign-in (pages) / 401 (the API). */
export function requireUser(event: RequestEvent): SessionUser {
	const { user } = event.locals;
	if (user) return user;
	if (isApi(event) || event.request.method !== 'GET') error(401, 'Sign in first.');
	redirect(303, `/signin?next=${encodeURIComponent(event.url.pathname + event.url.search)}`);
}

/** The lookups a GET request already made: its layout and its page both check the same workspace. */
const looked = new WeakMap<App.Locals, Map<string, ReturnType<typeof findMembership>>>();

/**
 * The membership, looked up once per GET request. Only GET: a form action may change the membership
 * (a role, leaving), and the page's load that follows in the same request must see the change.
 */
function membershipOnce(event: RequestEvent, workspaceId: string, userId: string) {
	if (event.request.method !== 'GET') return findMembership(workspaceId, userId);
	let seen = looked.get(event.locals);
	if (!seen) looked.set(event.locals, (seen = new Map()));
	const key = `${workspaceId} ${userId}`;
	let found = seen.get(key);
	if (!found) seen.set(key, (found = findMembership(workspaceId, userId)));
	return found;
}

/**
 * The one authorization check for anything inside a workspace. Someone who is not a member gets 404
 * (not 403), so nobody can learn which workspaces exist; a member below the needed role gets 403.
 */
export async function requireRole(
	event: RequestEvent,
	workspaceId: string,
	needed: Role
): Promise<WorkspaceAccess> {
	const user = requireUser(event);
	if (!UUID.test(workspaceId)) error(404, 'Not found');
	const row = await membershipOnce(event, workspaceId, user.id);
	if (!row) error(404, 'Not found');
	if (!roleAtLeast(row.role, needed))
		error(403, `This needs the ${needed} role; you are a ${row.role} here.`);
	return { user, workspace: { id: row.id, name: row.name }, role: row.role };
}

/** Platform admins curate the public tariff library. */
export function requireAdmin(event: RequestEvent): SessionUser {
	const user = requireUser(event);
	if (!user.isAdmin) error(403, 'Only platform admins may do this.');
	return user;
}

/** Whether `role` may do what needs `needed` (the rank order of db/schema/workspace.ts). */
export const can = roleAtLeast;

/**
 * Read access to a tariff: public tariffs are open to everyone (the quick estimate uses them); a private
 * one only to members of its workspace — anyone else gets 404.
 */
export async function requireTariffRead(event: RequestEvent, tariffId: string) {
	if (!UUID.test(tariffId)) error(404, 'Not found');
	const found = await findTariff(tariffId);
	if (!found) error(404, 'Not found');
	if (found.tariff.workspaceId) {
		if (!event.locals.user) error(404, 'Not found');
		const access = await memberRole(event.locals.user.id, found.tariff.workspaceId);
		if (!access) error(404, 'Not found');
		return { ...found, role: access };
	}
	return { ...found, role: null };
}

/** Write access: only platform admins touch public tariffs; only that workspace's editors its private ones. */
export async function requireTariffWrite(event: RequestEvent, tariffId: string) {
	const user = requireUser(event);
	const found = await requireTariffRead(event, tariffId);
	if (found.tariff.workspaceId) {
		if (!found.role || !can(found.role, 'editor'))
			error(403, 'Only editors of this workspace may change its tariffs.');
	} else if (!user.isAdmin) error(403, 'Only platform admins may change public tariffs.');
	return { ...found, user };
}

export type SiteAccess = { user: SessionUser; site: SiteRow; role: Role; viaGrant: boolean };

/**
 * Access to one site: a member of its workspace has their workspace role there; someone the site was
 * shared with has the grant's role (editor or viewer) for that site only. Anyone else gets 404.
 */
export async function requireSiteAccess(
	event: RequestEvent,
	siteId: string,
	needed: Role
): Promise<SiteAccess> {
	const user = requireUser(event);
	if (!UUID.test(siteId)) error(404, 'Not found');
	const site = await findSite(siteId);
	if (!site) error(404, 'Not found');
	const member = await memberRole(user.id, site.workspaceId);
	const role = member ?? (await siteGrantRole(siteId, user.id));
	if (!role) error(404, 'Not found');
	if (!can(role, needed)) error(403, `This needs the ${needed} role; you are a ${role} here.`);
	return { user, site, role, viaGrant: !member };
}

/** A scenario, through its site's access rule. */
export async function requireScenarioAccess(event: RequestEvent, scenarioId: string, needed: Role) {
	requireUser(event);
	if (!UUID.test(scenarioId)) error(404, 'Not found');
	const scenario = await findScenario(scenarioId);
	if (!scenario || scenario.deletedAt) error(404, 'Not found');
	const access = await requireSiteAccess(event, scenario.siteId, needed);
	return { ...access, scenario };
}
