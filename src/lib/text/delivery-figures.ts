import type { Delivery } from '$lib/calc';
import { figure } from './numbers';

/**
 * What a scenario delivers beside what it costs, in the same words on the scenario page, the compare
 * page, the printable report, the cost justification, the workbook and the CSV. Browser-safe.
 */
export const DELIVERY_LABELS = {
	waterMoved: 'Water moved',
	turnovers: 'Tank turnovers per hour',
	oxygenSupplied: 'Oxygen supplied',
	oxygenDemand: 'The stock’s oxygen demand',
	mainsInWater: 'Mains-powered devices in the water',
	waterIfLargestFails: 'Water moved if the largest unit fails',
	oxygenIfLargestFails: 'Oxygen supplied if the largest unit fails'
} as const;

export type DeliveryLabel = keyof typeof DELIVERY_LABELS;

/** Litres in one US gallon: 231 cubic inches exactly (NIST Handbook 44, Appendix C). */
export const LITERS_PER_US_GALLON = 3.785411784;

/** Where a figure is not known, how to get it (a grower's next step, not an error). */
export const HOW_TO_KNOW = {
	water:
		'Not known: give each water pump’s flow (water moved, L/min) in the equipment list, or design the air-lifts.',
	turnovers: 'Not known: give the site’s tanks and their volumes, and the water moved.',
	oxygenSupplied: 'Not known: design the air side (aeration or air-lifts) on the scenario page.',
	oxygenDemand:
		'Not known: give each tank’s fish and daily feed on the site, or the demand in the aeration design.'
} as const;

/** "1,200 L/min (317 US gal/min)": water always in both units. */
export function waterText(lpm: number): string {
	return `${figure(lpm, lpm < 10 ? 1 : 0)} L/min (${figure(lpm / LITERS_PER_US_GALLON, lpm < 40 ? 1 : 0)} US gal/min)`;
}

/** "2.4 turnovers per hour". */
export const turnoversText = (perHour: number) =>
	`${figure(perHour, perHour < 10 ? 2 : 1)} ${perHour === 1 ? 'turnover' : 'turnovers'} per hour`;

/** "152 g O₂/h". */
export const oxygenText = (gramsPerHour: number) =>
	`${figure(gramsPerHour, gramsPerHour < 10 ? 1 : 0)} g O₂/h`;

/** "1 unit", "3 units". */
export const unitsText = (count: number) => `${count} ${count === 1 ? 'unit' : 'units'}`;

/** Whether the oxygen supplied covers the demand; null when either is not known. */
export function oxygenEnough(
	delivery: Pick<Delivery, 'oxygenSuppliedGramsPerHour' | 'oxygenDemandGramsPerHour'>
) {
	const { oxygenSuppliedGramsPerHour: supplied, oxygenDemandGramsPerHour: demand } = delivery;
	if (supplied === null || demand === null) return null;
	// A design sized to the demand supplies it exactly: rounding must not call that short.
	return supplied >= demand * (1 - 1e-9);
}

/** The target dissolved oxygen the demand is held at: the design's, else the designer's default 5 mg/L. */
export const targetDo = (delivery: Pick<Delivery, 'targetDoMgL'>) => delivery.targetDoMgL ?? 5;

/** One row of the delivery table as text: the figure with its units, or "not known" and how to know it. */
export function deliveryCells(d: Delivery) {
	const fails = d.ifLargestFails;
	return {
		waterMoved: d.waterLpm === null ? HOW_TO_KNOW.water : waterText(d.waterLpm),
		turnovers: d.turnoversPerHour === null ? HOW_TO_KNOW.turnovers : turnoversText(d.turnoversPerHour),
		oxygenSupplied:
			d.oxygenSuppliedGramsPerHour === null
				? HOW_TO_KNOW.oxygenSupplied
				: oxygenText(d.oxygenSuppliedGramsPerHour),
		oxygenDemand:
			d.oxygenDemandGramsPerHour === null
				? HOW_TO_KNOW.oxygenDemand
				: `${oxygenText(d.oxygenDemandGramsPerHour)} at ${figure(targetDo(d), 1)} mg/L dissolved oxygen`,
		mainsInWater: unitsText(d.mainsDevicesInWater),
		waterIfLargestFails:
			fails.waterLpm === null
				? HOW_TO_KNOW.water
				: `${waterText(fails.waterLpm)}${fails.waterUnit ? ` without one “${fails.waterUnit}”` : ''}`,
		oxygenIfLargestFails:
			fails.oxygenSuppliedGramsPerHour === null
				? HOW_TO_KNOW.oxygenSupplied
				: `${oxygenText(fails.oxygenSuppliedGramsPerHour)}${fails.oxygenUnit ? ` without one “${fails.oxygenUnit}”` : ''}`
	} satisfies Record<DeliveryLabel, string>;
}

/** A delivery with nothing known (no flows given, no design, no tanks): for fixtures and old reports. */
export const DELIVERY_NOT_KNOWN: Delivery = {
	waterLpm: null,
	turnoversPerHour: null,
	oxygenSuppliedGramsPerHour: null,
	oxygenDemandGramsPerHour: null,
	targetDoMgL: null,
	mainsDevicesInWater: 0,
	ifLargestFails: { waterLpm: null, waterUnit: null, oxygenSuppliedGramsPerHour: null, oxygenUnit: null }
};
