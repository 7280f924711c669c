import type { DemandCharge } from './tariff.schema';

/** A billing period's peak kW over all its intervals, with the month the period begins in. */
export interface MeasuredPeak {
	month: number;
	kw: number | null;
}

/**
 * The ratchet's floor on billing demand: its percent of the highest peak among the earlier billing
 * periods it looks at — the `monthsBack` periods just before this one, or those of the 11 before it
 * whose month is listed. A period's peak is its highest demand over all its intervals, whatever price
 * or window applied then (as NREL's REopt looks back on the open rate database's ratchets), so a
 * summer charge's ratchet can be set by a winter peak. Only periods of the same calculation count
 * (earlier history is not known), on whichever version of the tariff each was priced: across a rate
 * change the new version's ratchet looks back on the old version's months too.
 */
export function ratchetFloorKw(charge: DemandCharge, earlier: readonly MeasuredPeak[]): number {
	const { ratchet } = charge;
	if (!ratchet) return 0;
	const window = ratchet.monthsBack !== undefined ? earlier.slice(-ratchet.monthsBack) : earlier.slice(-11);
	const listed = ratchet.months;
	let highest = 0;
	for (const peak of window) {
		if (listed && !listed.includes(peak.month)) continue;
		highest = Math.max(highest, peak.kw ?? 0);
	}
	return (ratchet.percent / 100) * highest;
}

/** A demand charge's amount on the billing demand: one price per kW, or tier by tier. */
export function demandAmount(charge: DemandCharge, billingKw: number): number {
	if (!charge.tiers) return (charge.perKw ?? 0) * billingKw;
	let amount = 0;
	let floor = 0;
	for (const tier of charge.tiers) {
		const ceiling = tier.uptoKw ?? Infinity;
		if (billingKw > floor) amount += (Math.min(billingKw, ceiling) - floor) * tier.perKw;
		floor = ceiling;
	}
	return amount;
}
