import type { Delivery } from '$lib/calc';
import { DELIVERY_LABELS, HOW_TO_KNOW, LITERS_PER_US_GALLON } from '$lib/text/delivery-figures';
import { a1, type SheetWriter } from './cells';
import { type DesignBlock, type DesignCells, writeDesignBlock } from './water-air-design';

export const WATER_AIR_SHEET = 'Water and air';

/** One compared scenario's delivery, the volume of its site's tanks, and its air design if it has one. */
export interface WaterAirScenario {
	name: string;
	delivery: Delivery;
	/** All the site's tanks together, L; null when the site has none. */
	tankVolumeLiters: number | null;
	design: Omit<DesignBlock, 'name'> | null;
}

/** Where the checked figures are, for the recalculation test. */
export interface WaterAirCells {
	gallonsPerMinute: (string | null)[];
	turnoversPerHour: (string | null)[];
	designs: (DesignCells | null)[];
}

const HEADERS = [
	'Scenario',
	`${DELIVERY_LABELS.waterMoved} (L/min)`,
	`${DELIVERY_LABELS.waterMoved} (US gal/min)`,
	'Water in the site’s tanks (L)',
	DELIVERY_LABELS.turnovers,
	`${DELIVERY_LABELS.oxygenSupplied} (g O₂/h)`,
	`${DELIVERY_LABELS.oxygenDemand} (g O₂/h)`,
	'Target dissolved oxygen (mg/L)',
	`${DELIVERY_LABELS.mainsInWater} (units)`,
	`${DELIVERY_LABELS.waterIfLargestFails} (L/min)`,
	`${DELIVERY_LABELS.oxygenIfLargestFails} (g O₂/h)`
];

/**
 * The "Water and air" sheet: what each scenario delivers beside what it costs, then each scenario's air
 * design with live formulas where the rule is closed-form (US gallons, turnovers, oxygen saturation,
 * Nicklin's air for each air-lift, the isothermal air power) and Runrate's values where it is not.
 */
export function writeWaterAirSheet(
	out: SheetWriter,
	title: string,
	scenarios: readonly WaterAirScenario[]
): WaterAirCells {
	out.widths([34, 16, 16, 16, 14, 16, 16, 14, 14, 18, 18]);
	out.text(1, 1, `${title}: water and air`, 'title');
	out.line(
		2,
		'What each scenario delivers beside what it costs. Pale cells are inputs; the US gallons, turnovers, oxygen saturation, each air-lift’s free air and the air power are live formulas. Where a figure is not known the cell says so.',
		11,
		'note'
	);
	out.headers(4, 1, HEADERS);
	const cells: WaterAirCells = { gallonsPerMinute: [], turnoversPerHour: [], designs: [] };
	scenarios.forEach((s, i) => {
		const row = 5 + i;
		const d = s.delivery;
		const value = (col: number, n: number | null, numFmt: string, missing: string) =>
			n === null ? out.text(row, col, missing, 'note') : out.number(row, col, n, numFmt, 'input');
		out.text(row, 1, s.name);
		value(2, d.waterLpm, '#,##0.0', 'not known');
		value(4, s.tankVolumeLiters, '#,##0', 'no tanks given');
		const water = a1(2, row);
		const volume = a1(4, row);
		if (d.waterLpm !== null) {
			out.formula(row, 3, `${water}/${LITERS_PER_US_GALLON}`, d.waterLpm / LITERS_PER_US_GALLON, '#,##0.0');
			cells.gallonsPerMinute.push(a1(3, row));
		} else cells.gallonsPerMinute.push(null);
		if (d.waterLpm !== null && s.tankVolumeLiters) {
			out.formula(row, 5, `${water}*60/${volume}`, d.turnoversPerHour, '0.00');
			cells.turnoversPerHour.push(a1(5, row));
		} else {
			out.text(row, 5, 'not known', 'note');
			cells.turnoversPerHour.push(null);
		}
		value(6, d.oxygenSuppliedGramsPerHour, '#,##0.0', 'not known');
		value(7, d.oxygenDemandGramsPerHour, '#,##0.0', 'not known');
		value(8, d.targetDoMgL, '0.0', '5.0 (default)');
		out.number(row, 9, d.mainsDevicesInWater, '0');
		value(10, d.ifLargestFails.waterLpm, '#,##0.0', 'not known');
		value(11, d.ifLargestFails.oxygenSuppliedGramsPerHour, '#,##0.0', 'not known');
	});
	let row = 5 + scenarios.length + 1;
	for (const line of [
		`Water moved not known: ${HOW_TO_KNOW.water.replace(/^Not known: /, '')}`,
		`Oxygen not known: ${HOW_TO_KNOW.oxygenSupplied.replace(/^Not known: /, '')}`,
		'If the largest unit fails: what is left with the one unit that moves the most water (or air) stopped.'
	])
		out.line(row++, line, 11, 'note');
	row++;
	for (const s of scenarios) {
		if (!s.design) {
			cells.designs.push(null);
			continue;
		}
		const written = writeDesignBlock(out, { name: s.name, ...s.design }, row);
		cells.designs.push(written.cells);
		row = written.row;
	}
	return cells;
}
