import type { AirDesign, AirDesignResult, DesignConditions } from '$lib/calc';
import { a1, type SheetWriter } from './cells';
import * as F from './water-air-formulas';

/** Metres in one unit of a depth as the designer takes it (international inch and foot, 1959: exact). */
const METERS_PER = { m: 1, cm: 0.01, ft: 0.3048, in: 0.0254 } as const;
const MM_PER = { mm: 1, in: 25.4 } as const;
/** L/min in one unit of flow (US gallon 3.785411784 L, NIST Handbook 44). */
const LPM_PER = { lpm: 1, gpm: 3.785411784, gph: 3.785411784 / 60, m3h: 1000 / 60 } as const;

/** One scenario's air design with the conditions it was worked out for and the core's answer. */
export interface DesignBlock {
	name: string;
	design: AirDesign;
	conditions: DesignConditions;
	result: AirDesignResult;
}

/** Where the checked figures of a design block are, for the recalculation test. */
export interface DesignCells {
	densityKgPerM3: string;
	saturationMgL: string;
	/** Free air per riser, one per air-lift of the design. */
	airliftAirLpm: string[];
	totalAirLpm: string;
	isothermalWatts: string;
}

const AIRLIFT_HEADERS = [
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
 * Writes one scenario's air design from `row`: its conditions, the water's properties (formulas), each
 * air-lift's free air by Nicklin's equation (formula), the aeration and pump as Runrate worked them
 * out (values), and the air power (formula). Returns the next free row and the checked cells.
 */
export function writeDesignBlock(
	out: SheetWriter,
	block: DesignBlock,
	from: number
): { row: number; cells: DesignCells } {
	const { design, conditions, result } = block;
	let row = from;
	out.text(row++, 1, `“${block.name}”: the air design`, 'heading');
	const ref = new Map<string, string>();
	const pair = (key: string, label: string, value: number | string, note: string, numFmt = '0.000') => {
		out.text(row, 1, label, 'bold');
		if (typeof value === 'number') out.number(row, 2, value, numFmt, 'input');
		else out.formula(row, 2, value, null, numFmt);
		out.text(row, 3, note, 'note');
		ref.set(key, a1(2, row, true));
		row++;
	};
	const r = (key: string) => ref.get(key) ?? '0';
	pair(
		't',
		'Water temperature (°C)',
		conditions.temperatureC,
		'The design’s water (the chosen tank, else 20 °C fresh water)',
		'0.0'
	);
	pair('s', 'Salinity (g/kg)', conditions.salinityGPerKg, 'Fresh water 0, sea water about 35', '0.0');
	pair('z', 'Altitude (m)', conditions.altitudeM, 'The site’s altitude', '0');
	pair('p', 'Barometric pressure (atm)', F.barometricAtm(r('z')), 'US Standard Atmosphere (1976)', '0.0000');
	pair('pa', 'Air pressure around the pump (Pa)', `${r('p')}*101325`, '1 atm = 101,325 Pa', '#,##0');
	pair(
		'rho',
		'Water density (kg/m³)',
		F.densityKgPerM3(r('t'), r('s')),
		'Millero & Poisson (1981), UNESCO EOS-80',
		'0.00'
	);
	pair('pwv', 'Water vapour pressure (atm)', F.vapourAtm(r('t')), 'Benson & Krause (1984)', '0.00000');
	pair(
		'sat',
		'Oxygen saturation (mg/L)',
		F.saturationMgL(r('t'), r('s'), r('p'), r('pwv')),
		'Benson & Krause (1984), APHA Standard Methods 4500-O, with the Green & Carritt pressure correction',
		'0.000'
	);
	const airliftAirLpm: string[] = [];
	const allRisers: string[] = [];
	if (design.airlifts.length) {
		row++;
		out.headers(row++, 1, AIRLIFT_HEADERS);
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
			out.formula(row, 8, F.columnKPa(r('rho'), c(4)), core?.injectionPressureKPa ?? null, '0.00');
			out.formula(
				row,
				9,
				F.nicklinAirLpm(r('rho'), c(6), c(5), c(4), c(7), r('pa')),
				core?.airFlowLpm ?? null,
				'0.0'
			);
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
	}
	row++;
	const aeration = result.aeration;
	if (aeration) {
		pair(
			'do',
			'Oxygen demand of the stock (g O₂/h)',
			aeration.oxygenDemandGramsPerHour,
			'Runrate’s figure from the feed, or as given',
			'0.0'
		);
		pair(
			'sotr',
			'Standard transfer needed (g O₂/h)',
			aeration.standardTransferGramsPerHour,
			'Runrate’s figure: Metcalf & Eddy’s field correction',
			'0.0'
		);
		pair(
			'aer',
			'Air for aeration (L/min)',
			aeration.airFlowLpm,
			'Runrate’s figure from the diffusers’ transfer per metre of depth',
			'0.0'
		);
	}
	const parts = [...allRisers, ...(aeration ? [r('aer')] : [])];
	pair(
		'q',
		'Free air in all (L/min)',
		`SUM(${parts.join(',') || '0'})`,
		'The air-lifts’ air plus the aeration’s',
		'0.0'
	);
	pair(
		'g',
		'Pump pressure, gauge (kPa)',
		result.pressureKPa,
		`The deepest outlet plus the line and diffuser loss (${design.lineLossKPa} kPa)`,
		'0.00'
	);
	pair(
		'w',
		'Isothermal air power (W)',
		F.isothermalWatts(r('pa'), r('q'), r('g')),
		'p₁·Q₁·ln(p₂/p₁): the least power that compresses this air',
		'0.0'
	);
	const pump = result.pump;
	out.text(row, 1, 'Air pumps', 'bold');
	out.text(
		row++,
		2,
		pump
			? `${pump.count} × ${pump.pumpName}: ${pump.flowEachLpm.toFixed(1)} L/min each at ${pump.gaugeKPa.toFixed(1)} kPa, ${pump.wattsTotal.toFixed(0)} W in all (${pump.wattsFrom === 'data-sheet' ? 'from the data sheet' : 'from the wire-to-air efficiency'})`
			: `${design.pump.name} cannot reach this pressure: choose another pump`,
		'wrap'
	);
	return {
		row: row + 1,
		cells: {
			densityKgPerM3: r('rho'),
			saturationMgL: r('sat'),
			airliftAirLpm,
			totalAirLpm: r('q'),
			isothermalWatts: r('w')
		}
	};
}
