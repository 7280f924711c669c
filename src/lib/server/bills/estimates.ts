import { listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { storedPrice } from '$lib/server/sites/stored-results';
import type { BillRow } from './bill.service';

/**
 * The baseline's estimate for each bill's own period (kWh and cost), for the year view; null for a
 * bill the baseline cannot be priced for (no tariff, or no version in force then).
 */
export async function billEstimates(site: SiteRow, bills: BillRow[]) {
	const baseline = (await listScenarios(site.id)).find((s) => s.isBaseline && !s.deletedAt);
	if (!baseline || bills.length === 0) return bills.map(() => null);
	const out: ({ kwh: number; cost: number } | null)[] = [];
	// The core takes at most 36 periods per run.
	for (let i = 0; i < bills.length; i += 36) {
		const chunk = bills.slice(i, i + 36);
		const priced = await storedPrice(site, baseline, {
			billingPeriods: chunk.map((b) => ({ from: b.periodFrom, to: b.periodTo }))
		});
		for (const [j] of chunk.entries()) {
			const p = priced.ok ? priced.result.periods[j] : undefined;
			out.push(p ? { kwh: p.kwh, cost: p.total } : null);
		}
	}
	return out;
}
