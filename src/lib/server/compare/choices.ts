import { and, asc, eq, inArray, isNull, or } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { memberships, scenarios, siteGrants, sites } from '$lib/server/db/schema';
import { type PickerChoices, boundChoices, bySite } from '$lib/components/compare/choice-filter';

export type { PickerChoices };

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
		.orderBy(asc(sites.name), asc(sites.id), asc(scenarios.position), asc(scenarios.name));
}

/** At most this many scenarios go to the compare page: the page stays small for the largest adviser. */
export const CHOICES_SENT = 1000;

/**
 * The compare page's choices among the scenarios the user may read (`readableScenarios` is the access
 * rule; this only leaves some out): all of them up to CHOICES_SENT, searched in the browser as the
 * person types; past that, a bounded list (`boundChoices`) that a search on the server narrows.
 */
export async function pickerChoices(
	userId: string,
	wanted: { find: string; picked: string[] }
): Promise<PickerChoices> {
	return boundChoices(bySite(await readableScenarios(userId)), wanted, CHOICES_SENT);
}
