import { describe, expect, it } from 'vitest';
import { exportOf } from './workbook-exports';
import { gardenRequest, hatcheryRequest } from './workbook-fixtures';
import { formulaAt, readBackOnce, sheet } from './workbook-read';

describe('the months of a time-of-use comparison with demand charges', () => {
	const input = exportOf(hatcheryRequest(), 'Alder Creek hatchery (invented)');
	const workbook = readBackOnce(input);

	it('rounds each charge line of a month to the cent, as the bill does', () => {
		const monthly = sheet(workbook(), 'Monthly');
		const first = input.response.scenarios[0]?.periods[0];
		const headers = (monthly.getRow(4).values as unknown[]).slice(3, 17);
		expect(headers).toContain('Peak demand: peak kW');
		expect(formulaAt(monthly, 'D5').formula).toMatch(/^ROUND\(/);
		expect(formulaAt(monthly, 'D5').result).toBe(first?.charges[0]?.amount);
		expect(formulaAt(monthly, 'P5').result).toBe(first?.total);
	});
});

describe('the months of a tiered comparison with a minimum bill', () => {
	const input = exportOf(gardenRequest(), 'Birchway school garden (invented)');
	const workbook = readBackOnce(input);

	it('adds the minimum-bill line in the months that fall short of it', () => {
		const monthly = sheet(workbook(), 'Monthly');
		const labels = monthly.getRow(4).values as unknown[];
		const col = labels.indexOf('Minimum bill');
		expect(col).toBeGreaterThan(0);
		const short = input.response.scenarios[0]?.periods.findIndex((p) =>
			p.charges.some((c) => c.kind === 'minimum')
		);
		expect(short).toBeGreaterThanOrEqual(0);
		const cell = formulaAt(monthly, `${monthly.getColumn(col).letter}${5 + (short ?? 0)}`);
		expect(cell.formula).toMatch(/^IF\(/);
		expect(cell.result).toBeGreaterThan(0);
	});
});

describe('the months of a scenario without equipment', () => {
	const request = gardenRequest();
	const empty = { ...request, scenarios: [...request.scenarios, { name: 'Nothing yet', equipment: [] }] };
	const input = exportOf(empty, 'Birchway school garden (invented)');
	const workbook = readBackOnce(input);

	it('bills only the fixed charges and the minimum, with 0 kWh', () => {
		const summary = sheet(workbook(), 'Summary');
		const expected = input.response.scenarios[3];
		expect(expected?.annualKwh).toBe(0);
		expect(formulaAt(summary, 'D8').formula).toMatch(/^'Monthly'!/);
		expect(formulaAt(summary, 'E8').result).toBe(expected?.annualCost);
		expect(formulaAt(summary, 'F8').formula).toBe('0');
	});
});
