import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { formulaAt, monthlyColumn, readBackOnce, sheet, texts } from './workbook-read';
import { exportOf } from './workbook-exports';
import { hatcheryRequest } from './workbook-fixtures';

/** An invented tariff of "Demo Valley Power": off-peak demand on weekday nights and whole weekends. */
const WEEKEND_DEMAND_TARIFF: TariffInput = {
	currency: 'USD',
	energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.12 }],
	demandCharges: [
		{
			label: 'Off-peak demand',
			perKw: 3,
			intervalMinutes: 60,
			windows: [{ start: '20:00', end: '15:00' }],
			weekendWindows: [{ start: '00:00', end: '24:00' }]
		}
	]
};

describe('a workbook on a tariff whose demand charge has other hours at weekends', () => {
	const input = exportOf(hatcheryRequest({ tariff: WEEKEND_DEMAND_TARIFF }), 'Weekend demand (invented)');
	const workbook = readBackOnce(input);
	const monthly = () => sheet(workbook(), 'Monthly');
	const column = (header: string) => monthlyColumn(monthly(), header);

	it('says on the Tariff sheet when the charge is measured', () => {
		expect(texts(sheet(workbook(), 'Tariff'))).toContain(
			'$3.00 per kW of the highest 60-minute demand in the billing period (weekdays 20:00–15:00 and all day at weekends)'
		);
	});

	it('writes the demand line as a formula that caches the core’s amount each month', () => {
		const line = column('Off-peak demand');
		input.response.scenarios[0]?.periods.forEach((period, m) => {
			const amount = period.charges.find((c) => c.label === 'Off-peak demand')?.amount;
			expect(amount).toBeGreaterThan(0);
			const cell = formulaAt(monthly(), `${line}${5 + m}`);
			expect(cell.formula).toMatch(/^ROUND\('Tariff'!\$C\$\d+\*[A-Z]+\d+,2\)$/);
			expect(cell.result).toBe(amount);
		});
	});
});
