import {
	barometricPressureAtm,
	isothermalAirWatts,
	oxygenSaturationMgL,
	STANDARD_ATMOSPHERE_PA,
	waterDensityKgPerM3,
	waterVapourPressureAtm,
	type AirDesign,
	type AirDesignResult,
	type DesignConditions
} from '$lib/calc';
import { a1, type SheetWriter } from './cells';
import { writeAirliftTable } from './water-air-airlifts';
import * as F from './water-air-formulas';

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
	// A formula's cached result is the core's figure, for programs that show a file without recalculating.
	const pair = (
		key: string,
		label: string,
		value: number | string,
		note: string,
		numFmt = '0.000',
		cached: number | null = null
	) => {
		out.text(row, 1, label, 'bold');
		if (typeof value === 'number') out.number(row, 2, value, numFmt, 'input');
		else out.formula(row, 2, value, cached, numFmt);
		out.text(row, 3, note, 'note');
		ref.set(key, a1(2, row, true));
		row++;
	};
	const r = (key: string) => ref.get(key) ?? '0';
	const { temperatureC: t, salinityGPerKg: salt } = conditions;
	const atm = barometricPressureAtm(conditions.altitudeM);
	const ambientPa = atm * STANDARD_ATMOSPHERE_PA;
	pair(
		't',
		'Water temperature (°C)',
		conditions.temperatureC,
		'The design’s water (the chosen tank, else 20 °C fresh water)',
		'0.0'
	);
	pair('s', 'Salinity (g/kg)', conditions.salinityGPerKg, 'Fresh water 0, sea water about 35', '0.0');
	pair('z', 'Altitude (m)', conditions.altitudeM, 'The site’s altitude', '0');
	pair(
		'p',
		'Barometric pressure (atm)',
		F.barometricAtm(r('z')),
		'US Standard Atmosphere (1976)',
		'0.0000',
		atm
	);
	pair(
		'pa',
		'Air pressure around the pump (Pa)',
		`${r('p')}*101325`,
		'1 atm = 101,325 Pa',
		'#,##0',
		ambientPa
	);
	pair(
		'rho',
		'Water density (kg/m³)',
		F.densityKgPerM3(r('t'), r('s')),
		'Millero & Poisson (1981), UNESCO EOS-80',
		'0.00',
		waterDensityKgPerM3(t, salt)
	);
	pair(
		'pwv',
		'Water vapour pressure (atm)',
		F.vapourAtm(r('t')),
		'Benson & Krause (1984)',
		'0.00000',
		waterVapourPressureAtm(t)
	);
	pair(
		'sat',
		'Oxygen saturation (mg/L)',
		F.saturationMgL(r('t'), r('s'), r('p'), r('pwv')),
		'Benson & Krause (1984), APHA Standard Methods 4500-O, with the Green & Carritt pressure correction',
		'0.000',
		oxygenSaturationMgL(t, salt, atm)
	);
	const lifts = writeAirliftTable(out, design, result, { density: r('rho'), ambientPa: r('pa') }, row);
	row = lifts.row;
	const { airliftAirLpm, allRisers } = lifts;
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
		'0.0',
		result.totalAirLpm
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
		'0.0',
		isothermalAirWatts(result.totalAirLpm, result.pressureKPa, ambientPa / 1000)
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
