// Who a tariff change notice reaches, and the links it carries: read by the notice job, the tariff page
// ("3 people in 2 workspaces were told") and the workspace's pages that list notices.
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '../db';
import { isLiveBaseline } from '../sites/scenario.service';
import { memberships, scenarios, sites, tariffs, tariffVersions, users } from '../db/schema';
import { tariffUsableBy } from './usable';

/**
 * The roles told of a tariff change: owners and editors, the members who can act on it (move a site to
 * another tariff, change its equipment). Viewers read the notice on the workspace's pages.
 */
export const NOTICE_ROLES = ['owner', 'editor'] as const;

/** The e-mail addresses of a workspace's owners and editors. */
export async function noticeRecipients(workspaceId: string): Promise<string[]> {
	const rows = await db
		.select({ email: users.email })
		.from(memberships)
		.innerJoin(users, eq(users.id, memberships.userId))
		.where(and(eq(memberships.workspaceId, workspaceId), inArray(memberships.role, [...NOTICE_ROLES])));
	return rows.map((row) => row.email);
}

/**
 * The live sites of a workspace (or of every workspace, without one) whose baseline is billed on the
 * tariff: the baseline's own tariff, else the site's. These are the sites a notice is about.
 */
export async function sitesBilledOn(tariffId: string, workspaceId?: string) {
	const billedOn = sql`coalesce(${scenarios.tariffId}, ${sites.tariffId})`;
	return db
		.selectDistinct({ id: sites.id, name: sites.name, workspaceId: sites.workspaceId })
		.from(sites)
		.innerJoin(scenarios, and(eq(scenarios.siteId, sites.id), isLiveBaseline()))
		.where(
			and(
				isNull(sites.archivedAt),
				sql`${billedOn} = ${tariffId}`,
				workspaceId ? eq(sites.workspaceId, workspaceId) : undefined
			)
		)
		.orderBy(sites.name);
}

/**
 * How many people a new version of this tariff tells by e-mail, in how many workspaces: the owners and
 * editors of each workspace allowed to use it with a site's baseline billed on it.
 */
export async function noticeAudience(tariffId: string): Promise<{ people: number; workspaces: number }> {
	const [tariff] = await db
		.select({ workspaceId: tariffs.workspaceId })
		.from(tariffs)
		.where(eq(tariffs.id, tariffId));
	if (!tariff) return { people: 0, workspaces: 0 };
	const workspaceIds = [...new Set((await sitesBilledOn(tariffId)).map((site) => site.workspaceId))].filter(
		(id) => tariffUsableBy(id, tariff)
	);
	if (workspaceIds.length === 0) return { people: 0, workspaces: 0 };
	const people = await db
		.selectDistinct({ userId: memberships.userId })
		.from(memberships)
		.where(and(inArray(memberships.workspaceId, workspaceIds), inArray(memberships.role, [...NOTICE_ROLES])));
	return { people: people.length, workspaces: workspaceIds.length };
}

export type NoticeLinks = {
	tariff: { id: string; name: string } | null;
	sites: { id: string; name: string }[];
};

const NO_LINKS: NoticeLinks = { tariff: null, sites: [] };

/**
 * The links of a stored notice: its tariff, and the workspace's sites billed on it now (names as they are
 * today). A notice's key is "<version id>:<workspace id>", which leads to its tariff; a tariff the
 * workspace may no longer use gets no links.
 */
export async function noticeLinks(workspaceId: string, dedupeKey: string): Promise<NoticeLinks> {
	const versionId = z.uuid().safeParse(dedupeKey.split(':')[0]);
	if (!versionId.success) return NO_LINKS;
	const [tariff] = await db
		.select({ id: tariffs.id, name: tariffs.name, workspaceId: tariffs.workspaceId })
		.from(tariffVersions)
		.innerJoin(tariffs, eq(tariffs.id, tariffVersions.tariffId))
		.where(eq(tariffVersions.id, versionId.data));
	if (!tariff || !tariffUsableBy(workspaceId, tariff)) return NO_LINKS;
	const billed = await sitesBilledOn(tariff.id, workspaceId);
	return {
		tariff: { id: tariff.id, name: tariff.name },
		sites: billed.map(({ id, name }) => ({ id, name }))
	};
}
