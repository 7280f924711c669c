// The cheapest-tariff query (`?scenario=&from=`) shared by the page, its printable report and its workbook.
import { error, type RequestEvent } from '@sveltejs/kit';
import { firstMonthOf, type FirstMonth } from '$lib/cheapest/first-month';
import { tariffComparisonBudgetSpent } from '$lib/server/http/rate-limits';
import type { SiteRow } from '$lib/server/sites/site.service';
import { findScenario, listScenarios } from '$lib/server/sites/scenario.service';
import { cheapestForScenario, cheapestTariffs, type Cheapest } from './cheapest';

const LIMITED =
	'You have compared tariffs many times in the last minute; wait a minute and try again. Nothing was priced.';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type CheapestAnswer = {
	cheapest: Cheapest;
	/** The scenario priced, or null for the metered usage. */
	scenario: { id: string; name: string } | null;
	/** The first month of a scenario's year and any message for its field; null for the metered usage. */
	from: FirstMonth | null;
	/** The site's live scenarios, for the load picker. */
	scenarios: { id: string; name: string }[];
	/** The query that reproduces this answer, for links to the report and the workbook ('' or '?…'). */
	search: string;
};

/**
 * Reads `?scenario=` and `?from=` and prices the load they name for `site`, which the caller's guard has
 * already let them read. A scenario that is not this site's live one is a 404, whatever its id: access
 * follows the site. A first month that is not a real month within reach is priced as the coming year,
 * with the message for its field. Each answer spends one of the caller's which-tariff budget; past it the
 * answer is a message (`limited`) and nothing is priced.
 */
export async function cheapestFromQuery(
	site: SiteRow,
	viaGrant: boolean,
	event: RequestEvent
): Promise<CheapestAnswer> {
	const { url } = event;
	const scenarioId = url.searchParams.get('scenario') || null;
	const scenario = scenarioId && UUID.test(scenarioId) ? await findScenario(scenarioId) : null;
	if (scenarioId && (!scenario || scenario.siteId !== site.id || scenario.deletedAt)) error(404, 'Not found');
	const scenarios = (await listScenarios(site.id)).filter((s) => !s.deletedAt && !s.archivedAt);
	const from = scenario ? firstMonthOf(url.searchParams.get('from'), site.timezone, new Date()) : null;
	const query = new URLSearchParams();
	if (scenario) query.set('scenario', scenario.id);
	if (from && !from.issue) query.set('from', from.month);
	const limited = await tariffComparisonBudgetSpent(event);
	return {
		cheapest: limited
			? { ok: false, limited: true, message: LIMITED }
			: scenario && from
				? await cheapestForScenario(site, viaGrant, scenario, from.month)
				: await cheapestTariffs(site, viaGrant),
		scenario: scenario ? { id: scenario.id, name: scenario.name } : null,
		from,
		scenarios: scenarios.map((s) => ({ id: s.id, name: s.name })),
		search: query.size ? `?${query}` : ''
	};
}
