/**
 * Which of a tariff's charges the workbook writes as values instead of formulas, and why: the words
 * the Tariff sheet and the Assumptions sheet show. Everything not listed here stays a live formula.
 */
import { type Tariff, hasTouTiers } from '$lib/calc';

/** Whether the devices' monthly costs are written as Runrate's values (their formulas cannot follow). */
export function devicesAsValues(tariff: Tariff): boolean {
	return valueReasons(tariff).length > 0;
}

/**
 * One sentence per kind of charge whose monthly amounts, or whose share per device, the workbook holds
 * as values. A tiered time-of-use season blends its tiers over every period's kWh, which needs each
 * period's kWh of the month (the 15-minute grid); tiered and ratcheted demand split among devices by
 * each one's kW at the peak, at the month's own price per kW, which the device rows' single formula
 * cannot state.
 */
export function valueReasons(tariff: Tariff): string[] {
	const reasons: string[] = [];
	if (tariff.energyCharges.some(hasTouTiers)) {
		reasons.push(
			'Time-of-use charges with tiers inside their periods: each month’s line on the Monthly sheet, and each device’s monthly cost, are values computed by Runrate (the tiers are shared among the periods by their kWh on the 15-minute grid, which no simple formula follows).'
		);
	}
	if (tariff.demandCharges.some((charge) => charge.tiers || charge.ratchet)) {
		reasons.push(
			'Tiered or ratcheted demand charges: the Monthly sheet prices them with live formulas (billing kW, tiers), but each device’s monthly cost is a value computed by Runrate, since its share of such a charge depends on the month’s price per kW at the peak.'
		);
	}
	return reasons;
}
