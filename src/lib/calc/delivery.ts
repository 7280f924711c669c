import type { AirDesign } from './air-design.schema';
import { designAir } from './air-design';
import { designConditions } from './design-conditions';
import type { SiteWater } from './site-water.schema';

/** What the delivery view needs of a device: its duty, how many, whether it sits in the water, and its flow. */
export interface DeliveryDevice {
	name: string;
	category: string;
	quantity: number;
	inWater?: boolean;
	waterLpm?: number;
	airLpm?: number;
}

export interface Delivery {
	waterLpm: number | null;
	turnoversPerHour: number | null;
	oxygenSuppliedGramsPerHour: number | null;
	oxygenDemandGramsPerHour: number | null;
	targetDoMgL: number | null;
	mainsDevicesInWater: number;
	ifLargestFails: {
		waterLpm: number | null;
		waterUnit: string | null;
		oxygenSuppliedGramsPerHour: number | null;
		oxygenUnit: string | null;
	};
}

const AIR_CATEGORIES = new Set(['air-pump', 'aerator']);

/** The one unit whose loss costs the most, and what is left without it. */
function worstUnit(units: { name: string; loss: number }[], total: number) {
	const worst = units.reduce<{ name: string; loss: number } | null>(
		(a, b) => (a && a.loss >= b.loss ? a : b),
		null
	);
	return worst ? { left: total - worst.loss, name: worst.name } : { left: total, name: null };
}

/**
 * What a scenario delivers beside what it costs: water moved (its water pumps' flows, plus the
 * air-lifts of its air design fed by the air its air pumps deliver — an air-lift's water scales with
 * its air at a fixed efficiency, and stops at the riser's limit), tank turnovers per hour, oxygen put
 * into the water against the stock's demand at the design's target, mains devices in the water, and
 * the same water and oxygen when the single unit whose loss costs most fails (air beyond the
 * design's need is bled off, so it adds nothing until a pump fails). Null where it is not
 * known: a water pump without its flow, or air pumps without their air or a design.
 */
export function scenarioDelivery(
	devices: readonly DeliveryDevice[],
	design: AirDesign | null,
	water: SiteWater
): Delivery {
	const conditions = designConditions(water, design?.aeration?.tankId ?? null);
	const pumps = devices.filter((d) => d.category === 'water-pump' && d.quantity > 0);
	const blowers = devices.filter((d) => AIR_CATEGORIES.has(d.category) && d.quantity > 0);
	const pumpWater = pumps.every((d) => d.waterLpm !== undefined)
		? pumps.reduce((sum, d) => sum + (d.waterLpm ?? 0) * d.quantity, 0)
		: null;
	const airKnown = blowers.length > 0 && blowers.every((d) => d.airLpm !== undefined);
	const airLpm = airKnown ? blowers.reduce((sum, d) => sum + (d.airLpm ?? 0) * d.quantity, 0) : null;
	const result = design ? designAir(design, conditions) : null;
	// Air beyond what the design needs is bled off at a valve (common practice), so a spare pump adds
	// nothing until one fails; less air lifts less water, in proportion at a fixed efficiency.
	const served = (air: number) =>
		result && result.totalAirLpm > 0 ? Math.min(air / result.totalAirLpm, 1) : 0;
	const lifted = (air: number) => (result ? result.waterLpm * served(air) : 0);
	const liftedLpm = result && result.airlifts.length > 0 ? (airLpm === null ? null : lifted(airLpm)) : 0;
	const waterLpm =
		pumpWater === null || liftedLpm === null || (pumps.length === 0 && !result?.airlifts.length)
			? null
			: pumpWater + liftedLpm;
	const oxygenWith = (air: number) => (result ? result.oxygenSuppliedGramsPerHour * served(air) : 0);
	const oxygen = result && airLpm !== null ? oxygenWith(airLpm) : null;
	const volume = conditions.tankVolumeLiters ?? water.tanks.reduce((sum, t) => sum + t.volumeLiters, 0);

	const biggestAir = airLpm ? blowers.reduce((a, b) => ((b.airLpm ?? 0) > (a.airLpm ?? 0) ? b : a)) : null;
	const airLeft = (airLpm ?? 0) - (biggestAir?.airLpm ?? 0);
	const waterLoss =
		waterLpm === null
			? null
			: worstUnit(
					[
						...pumps.map((d) => ({ name: d.name, loss: d.waterLpm ?? 0 })),
						...(biggestAir ? [{ name: biggestAir.name, loss: (liftedLpm ?? 0) - lifted(airLeft) }] : [])
					],
					waterLpm
				);
	return {
		waterLpm,
		turnoversPerHour: waterLpm !== null && volume > 0 ? (waterLpm * 60) / volume : null,
		oxygenSuppliedGramsPerHour: oxygen,
		oxygenDemandGramsPerHour: conditions.oxygenDemandGramsPerHour,
		targetDoMgL: result ? result.targetDoMgL : null,
		mainsDevicesInWater: devices.reduce((sum, d) => sum + (d.inWater ? d.quantity : 0), 0),
		ifLargestFails: {
			waterLpm: waterLoss ? waterLoss.left : null,
			waterUnit: waterLoss ? waterLoss.name : null,
			oxygenSuppliedGramsPerHour: oxygen === null ? null : oxygenWith(airLeft),
			oxygenUnit: oxygen === null || !biggestAir ? null : biggestAir.name
		}
	};
}
