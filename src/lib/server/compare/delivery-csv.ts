import type { Delivery } from '$lib/calc';
import { neutraliseFormula } from '$lib/server/exports/safe-text';
import { LITERS_PER_US_GALLON } from '$lib/text/delivery-figures';

/**
 * What each scenario delivers, as columns of the comparison CSV: plain numbers, empty where a figure is
 * not known (the page and the workbook say how to know it); the failed units' names are words.
 */
export const deliveryCsvColumns = [
	'water_moved_L_per_min',
	'water_moved_US_gal_per_min',
	'tank_turnovers_per_hour',
	'oxygen_supplied_g_O2_per_h',
	'oxygen_demand_g_O2_per_h',
	'target_dissolved_oxygen_mg_per_L',
	'mains_powered_devices_in_the_water',
	'water_moved_if_the_largest_unit_fails_L_per_min',
	'largest_water_unit',
	'oxygen_supplied_if_the_largest_unit_fails_g_O2_per_h',
	'largest_oxygen_unit'
] as const;

/** The columns that hold words, not figures. */
export const DELIVERY_CSV_WORDS = new Set<string>(['largest_water_unit', 'largest_oxygen_unit']);

const fixed = (n: number | null, digits: number) => (n === null ? '' : n.toFixed(digits));

/** One scenario's values, in the order of `deliveryCsvColumns`. */
export function deliveryCsvValues(d: Delivery): string[] {
	const fails = d.ifLargestFails;
	return [
		fixed(d.waterLpm, 1),
		fixed(d.waterLpm === null ? null : d.waterLpm / LITERS_PER_US_GALLON, 2),
		fixed(d.turnoversPerHour, 2),
		fixed(d.oxygenSuppliedGramsPerHour, 1),
		fixed(d.oxygenDemandGramsPerHour, 1),
		fixed(d.targetDoMgL, 1),
		String(d.mainsDevicesInWater),
		fixed(fails.waterLpm, 1),
		neutraliseFormula(fails.waterUnit ?? ''),
		fixed(fails.oxygenSuppliedGramsPerHour, 1),
		neutraliseFormula(fails.oxygenUnit ?? '')
	];
}
