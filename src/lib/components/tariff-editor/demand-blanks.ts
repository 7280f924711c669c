/** A demand charge's pricing in the editor: one price or tiers by kW, and a ratchet switched on. */
import type { DemandChargeInput } from './tariff-blanks';

export type DemandTierInput = NonNullable<DemandChargeInput['tiers']>[number];

/**
 * Moves a demand charge between one price per kW and tiers by kW. Tiers start from the price typed
 * (the first 100 kW, then the rest at the same price, round numbers a person types over); back to one
 * price keeps the first tier's price.
 */
export function setDemandPricing(charge: DemandChargeInput, tiered: boolean): void {
	if (tiered === (charge.tiers !== undefined)) return;
	if (tiered) {
		const perKw = typeof charge.perKw === 'number' ? charge.perKw : 0;
		delete charge.perKw;
		charge.tiers = [
			{ uptoKw: 100, perKw },
			{ uptoKw: null, perKw }
		];
	} else {
		charge.perKw = charge.tiers?.[0]?.perKw ?? 0;
		delete charge.tiers;
	}
}

/** A ratchet a person switches on: 80 % of the highest peak of the 11 months before (typed over). */
export function blankRatchet(): NonNullable<DemandChargeInput['ratchet']> {
	return { percent: 80, monthsBack: 11 };
}
