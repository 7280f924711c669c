import { describe, expect, it } from 'vitest';
import { priceRun } from './calculate';
import { device, flatTariff, line, request, sumOfLines } from './requests.fixture';

// Invented rates; the figures are derived from the rules of bill.ts and allocation.ts.
describe('a yearly minimum billed on a period already priced', () => {
	const [june] = priceRun(
		request({
			tariff: flatTariff(0.1, {
				fixedCharges: [{ label: 'Service', perMonth: 5 }],
				taxes: [{ label: 'Tax', percent: 8 }],
				minimumPerYear: 1000
			}),
			equipment: [
				device({ name: 'Pump', power: { watts: 100 } }),
				device({ name: 'Lamp', power: { watts: 50 } })
			],
			meter: { start: '2027-06-01T00:00', intervalMinutes: 60, kwh: Array.from({ length: 720 }, () => 0.25) }
		})
	);

	it('adds the line, taxes it with the rest and keeps the shares adding up to the total', () => {
		// 0.4 kW all June: 288 kWh × 0.10 = 28.80, service 5.00; subtotal 33.80, tax 2.70.
		expect(june!.subtotal).toBe(33.8);
		const topped = june!.withYearlyMinimum(50);
		expect(line(topped, 'minimum', 'Yearly minimum')).toBe(50);
		// Tax on 83.80: 6.70; total 90.50.
		expect(line(topped, 'tax', 'Tax')).toBe(6.7);
		expect(topped.total).toBe(90.5);
		expect(sumOfLines(topped)).toBeCloseTo(topped.total, 9);
		const shares = topped.equipment.reduce((sum, share) => sum + share.cost, topped.meter!.cost);
		expect(shares + topped.sharedCost).toBeCloseTo(topped.total, 9);
		// The usage is the one measured: the same kWh and device shares as before the top-up.
		expect(topped.kwh).toBe(june!.result.kwh);
		expect(topped.equipment).toEqual(june!.result.equipment);
	});
});
