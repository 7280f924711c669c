import { and, asc, eq, inArray, isNull, or } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { memberships, scenarios, siteGrants, sites } from '$lib/server/db/schema';

export interface ScenarioChoice {
	id: string;
	name: string;
	isBaseline: boolean;
	siteId: string;
	siteName: string;
}

/** Live scenarios of every site the user may read: their workspaces' sites and sites shared with them. */
export async function readableScenarios(userId: string): Promise<ScenarioChoice[]> {
	const workspaceIds = db
		.select({ id: memberships.workspaceId })
		.from(memberships)
		.where(eq(memberships.userId, userId));
	const grantedSites = db
		.select({ id: siteGrants.siteId })
		.from(siteGrants)
		.where(eq(siteGrants.userId, userId));
	return db
		.select({
			id: scenarios.id,
			name: scenarios.name,
			isBaseline: scenarios.isBaseline,
			siteId: sites.id,
			siteName: sites.name
		})
		.from(scenarios)
		.innerJoin(sites, eq(scenarios.siteId, sites.id))
		.where(
			and(
				isNull(scenarios.deletedAt),
				isNull(scenarios.archivedAt),
				isNull(sites.archivedAt),
				or(inArray(sites.workspaceId, workspaceIds), inArray(sites.id, grantedSites))
			)
		)
		.orderBy(asc(sites.name), asc(scenarios.position), asc(scenarios.name));
}
