import type { RequestEvent } from '@sveltejs/kit';
import { DateTime } from 'luxon';
import { scenarioIds, stillPicking } from '$lib/compare/picking';
import { MAX_COMPARED, parseComparisonQuery } from '$lib/compare/query';
import type { ComparisonReport } from '$lib/compare/types';
import { listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { buildComparison } from './build';
import type { PickerChoices } from './choices';

type Problem = { message: string; issues: { path: string; message: string }[] };

/** What a site's cost justification shows: the site's scenarios to pick from and their comparison. */
export interface Justification {
	choices: PickerChoices;
	/** The picked scenarios (default: the baseline, then the others), for the picker. */
	picked: { scenarios: string[]; baseline: string; start: string };
	report: ComparisonReport | null;
	problem: Problem | null;
}

/**
 * A site's cost justification: its live scenarios, and the comparison of those picked in the address
 * (by default the baseline and up to five others). Every scenario is read through the guard again in
 * `buildComparison`, and one of another site is refused here, so the page shows only this site.
 */
export async function siteJustification(event: RequestEvent, site: SiteRow): Promise<Justification> {
	const live = (await listScenarios(site.id)).filter((s) => !s.deletedAt && !s.archivedAt);
	const scenarios = live.map((s) => ({ id: s.id, name: s.name, isBaseline: s.isBaseline }));
	const choices = { sites: [{ id: site.id, name: site.name, scenarios }], left: 0 };
	const ordered = [...live].sort((a, b) => Number(b.isBaseline) - Number(a.isBaseline));
	const params = new URLSearchParams(event.url.searchParams);
	if (!params.has('scenarios'))
		params.set(
			'scenarios',
			ordered
				.slice(0, MAX_COMPARED)
				.map((s) => s.id)
				.join(',')
		);
	const today = DateTime.now().setZone(site.timezone).toISODate() ?? '2027-01-01';
	const parsed = parseComparisonQuery(params, today);
	const fallback = {
		scenarios: ordered.map((s) => s.id),
		baseline: ordered[0]?.id ?? '',
		start: `${today.slice(0, 4)}-01`
	};
	if (live.length < 2)
		return {
			choices,
			picked: fallback,
			report: null,
			problem: {
				message: 'This site has one scenario: add another (what you propose) to justify a change.',
				issues: []
			}
		};
	// Fewer than two while the person is still choosing (Find, Remove without scripts): no error yet.
	if (stillPicking(params))
		return {
			choices,
			picked: { ...fallback, scenarios: scenarioIds(params), baseline: params.get('baseline') ?? '' },
			report: null,
			problem: null
		};
	if (!parsed.ok)
		return {
			choices,
			picked: fallback,
			report: null,
			problem: { message: parsed.issues[0]?.message ?? 'Check the choices', issues: parsed.issues }
		};
	const picked = {
		scenarios: parsed.query.scenarios,
		baseline: parsed.query.baseline,
		start: parsed.query.start
	};
	const ids = new Set(live.map((s) => s.id));
	if (parsed.query.scenarios.some((id) => !ids.has(id))) {
		const message = 'Pick scenarios of this site: a cost justification is about one site';
		return { choices, picked, report: null, problem: { message, issues: [{ path: 'scenarios', message }] } };
	}
	const built = await buildComparison(event, parsed.query);
	if (!built.ok)
		return {
			choices,
			picked,
			report: null,
			problem: { message: built.message, issues: [{ path: built.path, message: built.message }] }
		};
	return { choices, picked, report: built.comparison.report, problem: null };
}
