// A scenario's own details, saved together from its page or the API: name, description, whether it is
// what is installed or a proposal, its one-off costs and its own tariff. Saved against the scenario's
// revision like its equipment, and recorded in the trail field by field.
import { and, eq } from 'drizzle-orm';
import type { RequestIssue } from '$lib/calc';
import { db } from '../db';
import { scenarios } from '../db/schema';
import type { Refusal } from '../http/answers';
import { findTariff } from '../tariffs/tariff.service';
import { chooserFor } from '../tariffs/usable';
import { audit, type Actor } from '../workspaces/audit';
import { fieldChanges, scenarioChangeWords } from './change-words';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import type { ScenarioDetails } from './scenario-details.schema';
import { tariffChoiceIssue } from './tariff-choice';

/** Who saves, on which scenario of which site; `viaGrant` marks a guest of the site. */
export type DetailsAccess = { site: SiteRow; scenario: ScenarioRow; user: Actor; viaGrant: boolean };

/** The tariff in words for the trail: "Demo Power — Small farm", or null for the site's tariff. */
async function tariffName(tariffId: string | null): Promise<string | null> {
	if (!tariffId) return null;
	const found = await findTariff(tariffId);
	return found ? `${found.tariff.utility} — ${found.tariff.name}` : 'a tariff no longer in the library';
}

/**
 * Saves the details if the scenario is still at `expectedRevision` (null: whatever it is now, for API
 * callers that send no revision). A changed tariff goes through the one rule of who may choose which
 * (`tariffChoiceIssue`, its issue at `tariffPath`). Nothing changed: nothing written and no event.
 * Answers the revision now, or why nothing was saved.
 */
export async function saveScenarioDetails(
	access: DetailsAccess,
	details: ScenarioDetails,
	expectedRevision: number | null,
	tariffPath = 'tariff.'
): Promise<{ revision: number } | Refusal> {
	const { site, scenario, user } = access;
	if (expectedRevision !== null && expectedRevision !== scenario.revision)
		return { conflict: scenario.revision };
	const choice =
		details.tariff === undefined
			? { tariffId: scenario.tariffId, tariffVersion: scenario.tariffVersion }
			: { tariffId: details.tariff?.tariffId ?? null, tariffVersion: details.tariff?.tariffVersion ?? null };
	// Keeping the tariff it has is no choice; a new one goes through the rule of who may choose which.
	const newTariff = choice.tariffId !== scenario.tariffId || choice.tariffVersion !== scenario.tariffVersion;
	if (details.tariff !== undefined && newTariff) {
		const issue = await tariffChoiceIssue(chooserFor(access, scenario), choice, tariffPath);
		if (issue) return { issues: [issue] satisfies RequestIssue[] };
	}
	const set = {
		name: details.name ?? scenario.name,
		description: details.description === undefined ? scenario.description : details.description,
		status: details.status ?? scenario.status,
		oneOffCosts: details.oneOffCosts ?? scenario.oneOffCosts,
		...choice
	};
	const trailed = (row: typeof set) => ({
		name: row.name,
		description: row.description,
		status: row.status,
		oneOffCosts: row.oneOffCosts,
		tariff: [row.tariffId, row.tariffVersion]
	});
	const changes = fieldChanges(trailed(scenario), trailed(set));
	if (Object.keys(changes).length === 0) return { revision: scenario.revision };
	if (changes.tariff)
		changes.tariff = { from: await tariffName(scenario.tariffId), to: await tariffName(set.tariffId) };
	return db.transaction(async (tx) => {
		const [saved] = await tx
			.update(scenarios)
			.set({ ...set, revision: scenario.revision + 1, updatedAt: new Date() })
			.where(and(eq(scenarios.id, scenario.id), eq(scenarios.revision, scenario.revision)))
			.returning({ revision: scenarios.revision });
		if (!saved) {
			const [now] = await tx
				.select({ revision: scenarios.revision })
				.from(scenarios)
				.where(eq(scenarios.id, scenario.id));
			return { conflict: now?.revision ?? scenario.revision };
		}
		await audit(tx, user, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'scenario',
			entityId: scenario.id,
			action: 'details',
			summary: `Scenario "${scenario.name}": ${scenarioChangeWords(changes, site.currency)}`,
			changes
		});
		return { revision: saved.revision };
	});
}
