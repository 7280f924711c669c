import type { AirDesign, AirDesignResult } from '$lib/calc';
import { a1, type SheetWriter } from './cells';
import * as F from './water-air-formulas';

/** Metres in one unit of a depth as the designer takes it (international inch and foot, 1959: exact). */
const METERS_PER = { m: 1, cm: 0.01, ft: 0.3048, in: 0.0254 } as const;
const MM_PER = { mm: 1, in: 25.4 } as const;
/** L/min in one unit of flow (US gallon 3.785411784 L, NIST Handbook 44). */
const LPM_PER = { lpm: 1, gpm: 3.785411784, gph: 3.785411784 / 60, m3h: 1000 / 60 } as const;

const HEADERS = [
	'Air-lift',
	'Count',
	'Riser inner diameter (mm)',
	'Submergence (m)',
	'Lift (m)',
	'Water per riser (L/min)',
	'Efficiency (%)',
	'Air pressure at the foot, gauge (kPa)',
	'Free air per riser (L/min)',
	'Free air, all risers (L/min)',
	'Most the riser carries (L/min)'
];

/**
 * The design's air-lifts, one row each, in metric: the inputs, the air pressure at the riser's foot
 * and the free air by Nicklin's equation as live formulas (from the block's water density and
 * ambient pressure cells), and the riser's limit as Runrate's value. Nothing when there are none.
 */
export function writeAirliftTable(
	out: SheetWriter,
	design: AirDesign,
	result: AirDesignResult,
	cells: { density: string; ambientPa: string },
	from: number
): { row: number; airliftAirLpm: string[]; allRisers: string[] } {
	const airliftAirLpm: string[] = [];
	const allRisers: string[] = [];
	if (design.airlifts.length === 0) return { row: from, airliftAirLpm, allRisers };
	let row = from + 1;
	out.headers(row++, 1, HEADERS);
	design.airlifts.forEach((lift, i) => {
		const core = result.airlifts[i];
		const c = (col: number) => a1(col, row);
		out.text(row, 1, lift.name);
		out.number(row, 2, lift.count, '0', 'input');
		out.number(row, 3, lift.riserInnerDiameter * MM_PER[lift.riserInnerDiameterUnit], '0.0', 'input');
		out.number(row, 4, lift.submergence * METERS_PER[lift.submergenceUnit], '0.000', 'input');
		out.number(row, 5, lift.lift * METERS_PER[lift.liftUnit], '0.000', 'input');
		out.number(row, 6, lift.waterFlow * LPM_PER[lift.waterFlowUnit], '0.0', 'input');
		out.number(row, 7, lift.efficiencyPercent, '0', 'input');
		out.formula(row, 8, F.columnKPa(cells.density, c(4)), core?.injectionPressureKPa ?? null, '0.00');
		const air = F.nicklinAirLpm(cells.density, c(6), c(5), c(4), c(7), cells.ambientPa);
		out.formula(row, 9, air, core?.airFlowLpm ?? null, '0.0');
		out.formula(row, 10, `${c(2)}*${c(9)}`, core?.totalAirLpm ?? null, '0.0');
		out.number(row, 11, core?.maxWaterFlowLpm ?? null, '0.0');
		airliftAirLpm.push(c(9));
		allRisers.push(c(10));
		row++;
	});
	out.line(
		row++,
		'The most a riser carries comes from the two-phase momentum model of Stenning & Martin (1968) with Griffith–Wallis slip, solved by Runrate: a value, not a formula.',
		8,
		'note'
	);
	return { row, airliftAirLpm, allRisers };
}
