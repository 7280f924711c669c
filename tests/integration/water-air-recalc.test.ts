import { execFile } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
	airDesignSchema,
	barometricPressureAtm,
	designAir,
	designConditions,
	isothermalAirWatts,
	oxygenSaturationMgL,
	scenarioDelivery,
	siteWaterSchema,
	STANDARD_ATMOSPHERE_PA,
	waterDensityKgPerM3
} from '$lib/calc';
import { deliveryDevice } from '$lib/compare/delivery-device';
import { SheetWriter } from '$lib/server/exports/cells';
import { comparisonWorkbook } from '$lib/server/exports/comparison-workbook';
import { FARM_DESIGN, FARM_WATER } from '$lib/server/exports/water-air.fixture';
import {
	WATER_AIR_SHEET,
	type WaterAirCells,
	type WaterAirScenario,
	writeWaterAirSheet
} from '$lib/server/exports/water-air-sheet';
import { exportOf } from '$lib/server/exports/workbook-exports';
import { hatcheryRequest } from '$lib/server/exports/workbook-fixtures';

/**
 * The outside check of the "Water and air" sheet, as workbook-recalc.test.ts does for the money:
 * LibreOffice Calc recalculates the exported workbook headless (recalculation forced on load), and
 * its figures for the closed-form rules — US gallons, turnovers, water density, oxygen saturation by
 * Benson & Krause, each air-lift's free air by Nicklin's equation, the isothermal air power — must
 * agree with the core within 0.1 %. The farm, its devices and its design are invented.
 */
const run = promisify(execFile);
const work = mkdtempSync(join(tmpdir(), 'runrate-water-air-'));
const RECALC_ALWAYS = `<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>
</oor:items>
`;

const water = siteWaterSchema.parse(FARM_WATER);
const design = airDesignSchema.parse(FARM_DESIGN);
const conditions = designConditions(water, design.aeration?.tankId ?? null);
const result = designAir(design, conditions);
const bigPump = {
	name: 'Large in-tank pump',
	category: 'water-pump',
	quantity: 1,
	inWater: true,
	waterLpm: 380
};
const small = [
	{ name: 'Small in-tank pump', category: 'water-pump', quantity: 1, inWater: true, waterLpm: 60 },
	{ name: 'Air pump', category: 'air-pump', quantity: 2, airLpm: 62 }
];
const waterAir: WaterAirScenario[] = [
	{
		name: 'Today: one large blower',
		delivery: scenarioDelivery([deliveryDevice(bigPump)], null, water),
		// The core's turnovers: all the tanks without a design, the aerated tank with one.
		tankVolumeLiters: designConditions(water, null).tankVolumeLiters,
		design: null
	},
	{
		name: 'Small pump and air-lifts',
		delivery: scenarioDelivery(small.map(deliveryDevice), design, water),
		tankVolumeLiters: conditions.tankVolumeLiters,
		design: { design, conditions, result }
	}
];
const comparison = { ...exportOf(hatcheryRequest(), 'Fernhollow farm (invented)'), waterAir };

let cells: WaterAirCells;
let sheet: ExcelJS.Worksheet | undefined;
let cached: ExcelJS.Worksheet | undefined;

const valueAt = (ws: ExcelJS.Worksheet | undefined, address: string | null | undefined) => {
	const cell = ws?.getCell((address ?? '').replaceAll('$', ''));
	if (cell?.type !== ExcelJS.ValueType.Formula) throw new Error(`no formula at ${address}`);
	return Number(cell.result);
};

beforeAll(async () => {
	// Where the sheet puts its figures: the same writer on a scratch workbook gives the same places.
	const scratch = new ExcelJS.Workbook();
	cells = writeWaterAirSheet(
		new SheetWriter(scratch.addWorksheet(WATER_AIR_SHEET), WATER_AIR_SHEET),
		comparison.title,
		waterAir
	);
	const input = join(work, 'in');
	const output = join(work, 'out');
	mkdirSync(join(work, 'profile', 'user'), { recursive: true });
	mkdirSync(input);
	writeFileSync(join(work, 'profile', 'user', 'registrymodifications.xcu'), RECALC_ALWAYS);
	const path = join(input, 'farm.xlsx');
	writeFileSync(path, await comparisonWorkbook(comparison));
	const profile = `-env:UserInstallation=file://${join(work, 'profile')}`;
	await run('soffice', [profile, '--headless', '--calc', '--convert-to', 'xlsx', '--outdir', output, path], {
		timeout: 180_000
	});
	const recalculated = new ExcelJS.Workbook();
	await recalculated.xlsx.readFile(join(output, 'farm.xlsx'));
	sheet = recalculated.getWorksheet(WATER_AIR_SHEET);
	const original = new ExcelJS.Workbook();
	await original.xlsx.readFile(path);
	cached = original.getWorksheet(WATER_AIR_SHEET);
}, 240_000);

afterAll(() => rmSync(work, { recursive: true, force: true }));

/** Within 0.1 % of the core's figure. */
const near = (actual: number, expected: number) =>
	expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * 0.001);

describe('LibreOffice recalculating the "Water and air" sheet', () => {
	it('is in the workbook beside the money sheets', () => {
		expect(sheet).toBeDefined();
		expect(cached).toBeDefined();
	});

	it('gets the water moved in US gallons and the turnovers the core gives (1 US gal = 3.785411784 L, NIST)', () => {
		waterAir.forEach((s, i) => {
			near(valueAt(sheet, cells.gallonsPerMinute[i]), (s.delivery.waterLpm ?? 0) / 3.785411784);
			near(valueAt(sheet, cells.turnoversPerHour[i]), s.delivery.turnoversPerHour ?? 0);
		});
	});

	it('gets the water’s density and its oxygen saturation at the site’s altitude (Benson & Krause 1984, APHA 4500-O)', () => {
		const block = cells.designs[1];
		const pressureAtm = barometricPressureAtm(conditions.altitudeM);
		near(
			valueAt(sheet, block?.densityKgPerM3),
			waterDensityKgPerM3(conditions.temperatureC, conditions.salinityGPerKg)
		);
		near(
			valueAt(sheet, block?.saturationMgL),
			oxygenSaturationMgL(conditions.temperatureC, conditions.salinityGPerKg, pressureAtm)
		);
	});

	it('gets each air-lift’s free air by Nicklin’s equation, the total air and the isothermal air power', () => {
		const block = cells.designs[1];
		result.airlifts.forEach((lift, i) => near(valueAt(sheet, block?.airliftAirLpm[i]), lift.airFlowLpm));
		near(valueAt(sheet, block?.totalAirLpm), result.totalAirLpm);
		const ambientKPa = (barometricPressureAtm(conditions.altitudeM) * STANDARD_ATMOSPHERE_PA) / 1000;
		near(
			valueAt(sheet, block?.isothermalWatts),
			isothermalAirWatts(result.totalAirLpm, result.pressureKPa, ambientKPa)
		);
	});
});
