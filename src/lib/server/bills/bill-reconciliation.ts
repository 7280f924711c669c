import { listDevices } from '$lib/server/sites/equipment.service';
import { listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { meteredKwh } from '../usage/usage.service';
import type { BillRow } from './bill.service';
import { reconcile, type Reconciled } from './reconcile';

/** The scenarios a bill can be checked against ("what is installed"), the baseline first. */
export async function installedChoices(siteId: string) {
	const live = (await listScenarios(siteId)).filter((s) => !s.deletedAt && !s.archivedAt);
	return [...live].sort((a, b) => Number(b.isBaseline) - Number(a.isBaseline));
}

/** A bill reconciled against the chosen scenario (the baseline when none or an unknown one is asked for). */
export async function reconcileBill(
	site: SiteRow,
	bill: BillRow,
	scenarioId: string | null
): Promise<{
	choices: { id: string; name: string; isBaseline: boolean }[];
	chosen: string | null;
	result: Reconciled;
}> {
	const choices = await installedChoices(site.id);
	const scenario = choices.find((s) => s.id === scenarioId) ?? choices[0];
	const list = choices.map((s) => ({ id: s.id, name: s.name, isBaseline: s.isBaseline }));
	if (!scenario)
		return {
			choices: list,
			chosen: null,
			result: { ok: false, message: 'This site has no scenario to compare the bill with.' }
		};
	const specs = (await listDevices(scenario.id)).map((d) => d.spec);
	const metered = await meteredKwh(site.id, bill.periodFrom, bill.periodTo, site.timezone);
	return {
		choices: list,
		chosen: scenario.id,
		result: await reconcile(site, scenario, specs, bill, metered)
	};
}
