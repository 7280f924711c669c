import { describe, expect, it } from 'vitest';
import { type ScheduleInput, device, flatTariff, line, onlyPeriod } from './requests.fixture';
import type { TariffInput } from './tariff.schema';
import { twoTierDelivery } from './tariffs.fixture';

const kilowatt = (schedule: ScheduleInput, more: object = {}) =>
	device({ power: { watts: 1000 }, schedule, ...more });

describe('a flat charge', () => {
	it('charges its rate on the period’s kWh', () => {
		const period = onlyPeriod({ tariff: flatTariff(0.2), equipment: [kilowatt({ type: 'always' })] });
		expect(period.kwh).toBeCloseTo(720, 9);
		expect(line(period, 'energy')).toBe(144);
	});

	it('applies only in its months, even inside a billing period that spans two', () => {
		const tariff: TariffInput = {
			currency: 'USD',
			energyCharges: [{ label: 'Winter adder', type: 'flat', perKwh: 0.01, months: [1] }]
		};
		const period = onlyPeriod({
			period: { billingPeriods: [{ from: '2027-01-12', to: '2027-02-10' }] },
			tariff,
			equipment: [kilowatt({ type: 'always' })]
		});
		expect(period.kwh).toBeCloseTo(720, 9);
		expect(line(period, 'energy')).toBe(4.8); // Jan 12–31: 20 days × 24 kWh × 0.01
	});
});

describe('a tiered charge in a calculation', () => {
	it('tiers the billing period’s total kWh', () => {
		const tariff = twoTierDelivery();
		const period = onlyPeriod({ tariff, equipment: [kilowatt({ type: 'always' })] });
		expect(line(period, 'energy')).toBe(42.6); // 500 × 0.05 + 220 × 0.08
	});
});
