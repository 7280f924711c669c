// The site page's scenario list with each scenario's cost over a calendar year, from stored results.
import { needsElectricalCaution } from '$lib/cautions';
import { listDevices } from './equipment.service';
import { UNDO_MS, type ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import { storedSummaries } from './stored-summaries';

/**
 * Every scenario still shown (a deleted one while it can be restored), each with its device count, the
 * in-water caution and its cost over the calendar `year`. Live ones are read in one go from stored
 * results; a deleted one is not priced, and only its devices are read.
 */
export async function priceScenarios(site: SiteRow, scenarios: ScenarioRow[], year: number) {
	const undoAfter = Date.now() - UNDO_MS;
	const shown = scenarios.filter((s) => !s.deletedAt || s.deletedAt.getTime() > undoAfter);
	const live = shown.filter((s) => !s.deletedAt);
	const priced = await storedSummaries(
		site.workspaceId,
		live.map((scenario) => ({ site, scenario })),
		{ start: `${year}-01`, months: 12 }
	);
	return Promise.all(
		shown.map(async (s) => {
			const answer = priced.get(s.id);
			const deleted = answer ? null : (await listDevices(s.id)).map((d) => d.spec);
			const summary = answer?.ok ? answer.summary : null;
			return {
				id: s.id,
				name: s.name,
				description: s.description,
				isBaseline: s.isBaseline,
				status: s.status,
				archived: !!s.archivedAt,
				deleted: !!s.deletedAt,
				deviceCount: answer ? (answer.ok ? answer.summary.deviceCount : answer.deviceCount) : deleted!.length,
				caution: answer
					? answer.ok
						? answer.summary.caution
						: answer.caution
					: needsElectricalCaution(deleted!),
				annual: summary ? { cost: summary.totals.cost, kwh: summary.totals.kwh } : null,
				problem: answer && !answer.ok ? answer.message : null,
				note: summary?.note ?? null
			};
		})
	);
}
