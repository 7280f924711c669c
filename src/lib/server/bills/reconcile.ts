import type { ChargeLine } from '$lib/calc';
import type { DeviceSpec } from '../db/schema';
import { priceScenario } from '$lib/server/sites/results.service';
import type { ScenarioRow } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import type { BillRow } from './bill.service';
import { scaledToBill } from './scale';
import { suggestionsFor } from './suggestions';

/** Over this share, the bill and the tariff's own figure for its kWh disagree (the rule). */
export const FLAG_PERCENT = 2;

export interface Metered {
	kwh: number;
	intervals: number;
	hoursCovered: number;
	hoursInPeriod: number;
}

export interface Reconciliation {
	scenario: { id: string; name: string };
	hours: number;
	billed: { kwh: number; amount: number; peakKw: number | null; effectivePerKwh: number | null };
	estimated: { kwh: number; cost: number; peakKw: number; charges: ChargeLine[]; tariffVersion: number };
	/** Billed kWh the list does not explain, and the always-on load that would (W); below zero when the list over-explains. */
	unexplained: { kwh: number; watts: number };
	/** The tariff applied to the billed kWh (the list's load shape, scaled to the bill). */
	recomputed: {
		amount: number;
		charges: ChargeLine[];
		difference: number;
		differencePercent: number | null;
		flagged: boolean;
	};
	metered: Metered | null;
	suggestions: string[];
}

export type Reconciled = { ok: true; reconciliation: Reconciliation } | { ok: false; message: string };

export async function reconcile(
	site: SiteRow,
	scenario: ScenarioRow,
	specs: DeviceSpec[],
	bill: BillRow,
	metered: Metered | null
): Promise<Reconciled> {
	const period = { billingPeriods: [{ from: bill.periodFrom, to: bill.periodTo }] };
	const priced = await priceScenario(site, scenario, specs, period);
	if (!priced.ok) return { ok: false, message: priced.message };
	const estimate = priced.result.periods[0]!;
	const version = priced.result.versions[0]?.number ?? 0;
	const recomputedRun = await priceScenario(
		site,
		scenario,
		scaledToBill(specs, estimate.kwh, bill.kwh, estimate.hours),
		period
	);
	if (!recomputedRun.ok) return { ok: false, message: recomputedRun.message };
	const recomputed = recomputedRun.result.periods[0]!;
	const difference = bill.amount - recomputed.total;
	const differencePercent = recomputed.total !== 0 ? (difference / recomputed.total) * 100 : null;
	const unexplainedKwh = bill.kwh - estimate.kwh;
	const reconciliation: Reconciliation = {
		scenario: { id: scenario.id, name: scenario.name },
		hours: estimate.hours,
		billed: {
			kwh: bill.kwh,
			amount: bill.amount,
			peakKw: bill.peakKw,
			effectivePerKwh: bill.kwh > 0 ? bill.amount / bill.kwh : null
		},
		estimated: {
			kwh: estimate.kwh,
			cost: estimate.total,
			peakKw: estimate.peakKw,
			charges: estimate.charges,
			tariffVersion: version
		},
		unexplained: { kwh: unexplainedKwh, watts: (unexplainedKwh / estimate.hours) * 1000 },
		recomputed: {
			amount: recomputed.total,
			charges: recomputed.charges,
			difference,
			differencePercent,
			flagged:
				differencePercent === null ? Math.abs(difference) >= 0.01 : Math.abs(differencePercent) > FLAG_PERCENT
		},
		metered,
		suggestions: []
	};
	reconciliation.suggestions = await suggestionsFor(site, scenario, specs, bill, reconciliation);
	return { ok: true, reconciliation };
}
