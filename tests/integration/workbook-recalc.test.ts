import { execFile } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type CompareResponse, compare, compareRequestSchema } from '$lib/calc';
import { comparisonWorkbook } from '$lib/server/exports/comparison-workbook';
import { exportOf } from '$lib/server/exports/workbook-exports';
import { gardenRequest, hatcheryRequest } from '$lib/server/exports/workbook-fixtures';
import { REAL_CHARGES_TARIFF } from '$lib/server/exports/workbook-tariffs';

/**
 * The outside check of the workbook: LibreOffice Calc (Debian's libreoffice-calc-nogui) opens each
 * exported workbook headless, recalculates every formula and saves it again; what it computed must
 * equal what compare() returned, to the cent. Its throwaway profile says to recalculate xlsx files on
 * load always (OOXMLRecalcMode 0) rather than trust their cached results, and the stale workbook below
 * proves that it did.
 */
const run = promisify(execFile);
const work = mkdtempSync(join(tmpdir(), 'runrate-recalc-'));
const RECALC_ALWAYS = `<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>
</oor:items>
`;

const hatchery = exportOf(hatcheryRequest(), 'Alder Creek hatchery (invented)');
const garden = exportOf(gardenRequest(), 'Birchway school garden (invented)');
// Other inputs (rates, and one more always-on air pump, which cannot move a demand peak) but the
// original figures as cached results: only a real recalculation gives the changed request's figures.
const changedInput = hatcheryRequest({
	finance: { horizonYears: 10, discountPercent: 8, escalationPercent: 1 }
});
const airPumps = changedInput.scenarios[1]?.equipment[1];
if (airPumps) airPumps.quantity = 3;
const changedRequest = compareRequestSchema.parse(changedInput);
// Every charge of issue 19 (invented rates) on the hatchery's equipment.
const realCharges = exportOf(hatcheryRequest({ tariff: REAL_CHARGES_TARIFF }), 'Real charges (invented)');
const files = { hatchery, garden, realCharges, stale: { ...hatchery, request: changedRequest } };

interface Figures {
	summary: Array<Record<string, number | string | null>>;
	/** Per scenario, the 12 monthly bill totals. */
	monthly: number[][];
}
const recalculated = new Map<string, Figures>();
const cached = new Map<string, Figures>();
const SUMMARY_COLUMNS = {
	annualKwh: 4,
	annualCost: 5,
	capitalCost: 6,
	maintenancePerYear: 7,
	savingsPerYear: 8,
	simplePaybackYears: 9,
	lifecycleCost: 10,
	co2KgPerYear: 11
};

async function figuresOf(path: string, scenarios: number): Promise<Figures> {
	const workbook = new ExcelJS.Workbook();
	await workbook.xlsx.readFile(path);
	const result = (sheet: ExcelJS.Worksheet | undefined, row: number, col: number) => {
		const cell = sheet?.getCell(row, col);
		if (cell?.type !== ExcelJS.ValueType.Formula) throw new Error(`${path}: no formula at ${row}/${col}`);
		// exceljs reads a cached 0 back as no result; "never" is the payback when nothing is saved.
		return (cell.result as number | string | undefined) ?? 0;
	};
	const summary = workbook.getWorksheet('Summary');
	const monthly = workbook.getWorksheet('Monthly');
	const totals: number[] = [];
	monthly?.getRow(4).eachCell((cell, col) => void (cell.value === 'Total' && totals.push(col)));
	return {
		summary: Array.from({ length: scenarios }, (_, s) =>
			Object.fromEntries(
				Object.entries(SUMMARY_COLUMNS).map(([key, col]) => [key, result(summary, 5 + s, col)])
			)
		),
		monthly: totals.map((col) => Array.from({ length: 12 }, (_, m) => Number(result(monthly, 5 + m, col))))
	};
}

beforeAll(async () => {
	const input = join(work, 'in');
	const output = join(work, 'out');
	mkdirSync(join(work, 'profile', 'user'), { recursive: true });
	mkdirSync(input);
	writeFileSync(join(work, 'profile', 'user', 'registrymodifications.xcu'), RECALC_ALWAYS);
	const paths = await Promise.all(
		Object.entries(files).map(async ([name, comparison]) => {
			const path = join(input, `${name}.xlsx`);
			writeFileSync(path, await comparisonWorkbook(comparison));
			return path;
		})
	);
	const profile = `-env:UserInstallation=file://${join(work, 'profile')}`;
	const convert = ['--headless', '--calc', '--convert-to', 'xlsx', '--outdir', output, ...paths];
	await run('soffice', [profile, ...convert], { timeout: 180_000 });
	for (const [name, comparison] of Object.entries(files)) {
		const count = comparison.request.scenarios.length;
		recalculated.set(name, await figuresOf(join(output, `${name}.xlsx`), count));
		cached.set(name, await figuresOf(join(input, `${name}.xlsx`), count));
	}
}, 240_000);

afterAll(() => rmSync(work, { recursive: true, force: true }));

function expectSame(figures: Figures | undefined, response: CompareResponse): void {
	expect(figures?.summary).toHaveLength(response.scenarios.length);
	response.scenarios.forEach((expected, s) => {
		const row = figures?.summary[s] ?? {};
		// Money from the bill is in cents, so equal to the cent means equal.
		expect(row.annualCost).toBe(expected.annualCost);
		expect(row.savingsPerYear).toBe(expected.savingsPerYear);
		expect(figures?.monthly[s]).toEqual(expected.periods.map((period) => period.total));
		expect(row.annualKwh).toBeCloseTo(expected.annualKwh, 3);
		expect(row.capitalCost).toBeCloseTo(expected.capitalCost, 2);
		expect(row.maintenancePerYear).toBeCloseTo(expected.maintenancePerYear, 2);
		expect(row.lifecycleCost).toBeCloseTo(expected.lifecycleCost, 2);
		expect(row.co2KgPerYear).toBeCloseTo(expected.co2KgPerYear, 3);
		if (expected.simplePaybackYears === null) expect(row.simplePaybackYears).toBe('never');
		else expect(row.simplePaybackYears).toBeCloseTo(expected.simplePaybackYears, 6);
	});
}

describe('LibreOffice recalculating an exported comparison', () => {
	it('gets compare()’s figures for time-of-use with demand charges, riders and two taxes', () => {
		expectSame(recalculated.get('hatchery'), hatchery.response);
	});

	it('counts only the one-off costs of the installed baseline as its purchase and installation', () => {
		// The hatchery's baseline is installed with a $40 one-off cost (invented): compare() says 40, and so
		// does LibreOffice from the workbook's formula, whatever its blower and heater cost to buy.
		expect(hatchery.request.scenarios[0]?.status).toBe('installed');
		expect(hatchery.response.scenarios[0]?.capitalCost).toBe(40);
		expect(recalculated.get('hatchery')?.summary[0]?.capitalCost).toBeCloseTo(40, 2);
	});

	it('gets compare()’s figures for tiers with a minimum bill, a per-day charge and a tax', () => {
		expect(
			garden.response.scenarios[0]?.periods.some((p) => p.charges.some((c) => c.kind === 'minimum'))
		).toBe(true);
		expectSame(recalculated.get('garden'), garden.response);
	});

	it('gets compare()’s figures for tiered time-of-use, daily tiers, tiered and ratcheted demand, yearly fixed charges and every minimum', () => {
		const lines = realCharges.response.scenarios.flatMap((scenario) =>
			scenario.periods.flatMap((period) => period.charges.map((charge) => charge.label))
		);
		// The fixture makes each rule bite: the daily minimum, the yearly minimum's top-up.
		expect(lines).toContain('Minimum bill');
		expect(lines).toContain('Yearly minimum');
		expectSame(recalculated.get('realCharges'), realCharges.response);
	});

	it('computes from the inputs, not from the cached results', () => {
		const changed = compare(changedRequest);
		const before = hatchery.response.scenarios[1];
		expect(cached.get('stale')?.summary[1]?.annualCost).toBe(before?.annualCost);
		expect(changed.scenarios[1]?.annualCost).not.toBe(before?.annualCost);
		expect(changed.scenarios[0]?.lifecycleCost).not.toBeCloseTo(
			hatchery.response.scenarios[0]?.lifecycleCost ?? 0,
			0
		);
		expectSame(recalculated.get('stale'), changed);
	});
});
