import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import {
	airDesignSchema,
	designAir,
	designConditions,
	oxygenSaturationMgL,
	barometricPressureAtm,
	scenarioDelivery,
	siteWaterSchema
} from '$lib/calc';
import { deliveryDevice } from '$lib/compare/delivery-device';
import { DELIVERY_NOT_KNOWN } from '$lib/text/delivery-figures';
import { SheetWriter } from './cells';
import { FARM_DESIGN, FARM_WATER } from './water-air.fixture';
import { WATER_AIR_SHEET, writeWaterAirSheet } from './water-air-sheet';

// The sheet as written (tests/integration/water-air-recalc.test.ts recalculates it in LibreOffice).
const water = siteWaterSchema.parse(FARM_WATER);
const design = airDesignSchema.parse(FARM_DESIGN);
const conditions = designConditions(water, 'tank-a');
const result = designAir(design, conditions);

function written() {
	const workbook = new ExcelJS.Workbook();
	const sheet = workbook.addWorksheet(WATER_AIR_SHEET);
	const cells = writeWaterAirSheet(new SheetWriter(sheet, WATER_AIR_SHEET), 'Invented farm', [
		{ name: 'Nothing known', delivery: DELIVERY_NOT_KNOWN, tankVolumeLiters: null, design: null },
		{
			name: 'Air-lifts',
			delivery: scenarioDelivery(
				[deliveryDevice({ name: 'Air pump', category: 'air-pump', quantity: 2, airLpm: 62 })],
				design,
				water
			),
			tankVolumeLiters: conditions.tankVolumeLiters,
			design: { design, conditions, result }
		}
	]);
	const at = (address: string | null | undefined) => sheet.getCell((address ?? 'A1').replaceAll('$', ''));
	return { sheet, cells, at };
}

describe('the "Water and air" sheet', () => {
	it('says "not known" where the core has no figure, and writes no formula there', () => {
		const { sheet, cells } = written();
		expect(sheet.getCell('B5').value).toBe('not known');
		expect(cells.gallonsPerMinute[0]).toBeNull();
		expect(cells.turnoversPerHour[0]).toBeNull();
		expect(cells.designs[0]).toBeNull();
	});

	it('writes live formulas with the core’s figures as their cached results', () => {
		const { cells, at } = written();
		const block = cells.designs[1]!;
		const saturation = at(block.saturationMgL);
		expect(saturation.type).toBe(ExcelJS.ValueType.Formula);
		expect(saturation.formula).toContain('EXP(-139.34411');
		expect(saturation.result).toBeCloseTo(
			oxygenSaturationMgL(conditions.temperatureC, conditions.salinityGPerKg, barometricPressureAtm(250)),
			9
		);
		const air = at(block.airliftAirLpm[0]);
		expect(air.formula).toContain('LN(');
		expect(air.result).toBe(result.airlifts[0]?.airFlowLpm);
		expect(at(block.totalAirLpm).result).toBe(result.totalAirLpm);
		expect(at(block.isothermalWatts).formula).toMatch(/\/60000\)\*LN\(/);
	});
});
