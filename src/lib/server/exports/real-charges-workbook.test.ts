import { describe, expect, it } from 'vitest';
import { formulaAt, monthlyColumn, readBackOnce, sheet, texts } from './workbook-read';
import { exportOf } from './workbook-exports';
import { hatcheryRequest } from './workbook-fixtures';
import { REAL_CHARGES_TARIFF } from './workbook-tariffs';

// Every charge of issue 19 on the invented hatchery (REAL_CHARGES_TARIFF). LibreOffice's recalculation
// of this workbook is checked in tests/integration/workbook-recalc.test.ts; here, what the cells hold.
describe('a workbook on a tariff with every new charge', () => {
	const input = exportOf(hatcheryRequest({ tariff: REAL_CHARGES_TARIFF }), 'Real charges (invented)');
	const workbook = readBackOnce(input);
	const monthly = () => sheet(workbook(), 'Monthly');
	const column = (header: string) => monthlyColumn(monthly(), header);

	it('writes the yearly fixed charge as a twelfth and the daily tiers × the days, as formulas', () => {
		expect(formulaAt(monthly(), `${column('Meter charge')}5`).formula).toMatch(
			/^ROUND\('Tariff'!\$C\$\d+\/12,2\)$/
		);
		expect(formulaAt(monthly(), `${column('Delivery: exact amount')}5`).formula).toMatch(
			/MIN\([A-Z]+5,'Tariff'!\$E\$\d+\*B5\)/
		);
	});

	it('bills ratcheted demand on the larger of the peak and the percent of the earlier peaks', () => {
		const billing = column('Demand: billing kW');
		const peak = column('Demand: peak kW');
		expect(formulaAt(monthly(), `${billing}5`).formula).toBe(`MAX(${peak}5)`);
		// The live percent times the highest whole-month peak before (a value: any price or window counts).
		expect(formulaAt(monthly(), `${billing}8`).formula).toMatch(
			new RegExp(`^MAX\\(${peak}8,'Tariff'!\\$C\\$\\d+/100\\*[\\d.]+\\)$`)
		);
		// Winter demand (January–March, November, December) looks back at January and February in March
		// and bills nothing in April, outside its months.
		const winter = column('Winter demand: billing kW');
		const winterPeak = column('Winter demand: peak kW');
		expect(formulaAt(monthly(), `${winter}7`).formula).toMatch(
			new RegExp(`^MAX\\(${winterPeak}7,'Tariff'!\\$C\\$\\d+/100\\*[\\d.]+\\)$`)
		);
		expect(formulaAt(monthly(), `${winter}8`).formula).toBe(`MAX(${winterPeak}8)`);
	});

	it('floors each month on the larger minimum and tops up the year on its last month', () => {
		expect(formulaAt(monthly(), `${column('Minimum bill')}5`).formula).toMatch(
			/MAX\('Tariff'!\$C\$\d+,'Tariff'!\$C\$\d+\*B5\)/
		);
		expect(formulaAt(monthly(), `${column('Yearly minimum')}5`).formula).toBe('0');
		expect(formulaAt(monthly(), `${column('Yearly minimum')}16`).formula).toMatch(/\*12\/12/);
	});

	it('holds the tiered time-of-use lines and the devices’ costs as values, and says why', () => {
		expect(REAL_CHARGES_TARIFF.energyCharges?.some((charge) => charge.type === 'tou')).toBe(true);
		const supply = monthly().getCell(`${column('Supply')}5`);
		expect(supply.value).toBe(
			input.response.scenarios[0]?.periods[0]?.charges.find((c) => c.label === 'Supply')?.amount
		);
		const notes = texts(sheet(workbook(), 'Tariff')).join(' ');
		expect(notes).toContain('Time-of-use charges with tiers inside their periods');
		expect(notes).toContain('Tiered or ratcheted demand charges');
		const scenario = sheet(workbook(), '2 Two small air pumps and a tim');
		expect(typeof scenario.getCell('AL7').value).toBe('number');
	});

	it('caches the core’s monthly totals', () => {
		const total = column('Total');
		input.response.scenarios[0]?.periods.forEach((period, m) => {
			expect(formulaAt(monthly(), `${total}${5 + m}`).result).toBe(period.total);
		});
	});
});
