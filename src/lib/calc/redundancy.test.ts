import { describe, expect, it } from 'vitest';
import { equipmentSchema, type EquipmentInput } from './equipment.schema';
import { redundancy } from './redundancy';

// Invented devices. The rule (what is left when the largest single unit fails) is the N+1 rule of
// thumb for pumps and blowers (common practice, no source).
const device = (input: Partial<EquipmentInput> & { name: string }) =>
	equipmentSchema.parse({ power: { watts: 100 }, schedule: { type: 'always' }, ...input });

describe('what runs when one unit fails', () => {
	it('leaves half the air with two equal air pumps', () => {
		const [air] = redundancy([
			device({ name: 'Air pump', category: 'air-pump', quantity: 2, power: { watts: 60 } })
		]);
		expect(air).toEqual({ duty: 'air', units: 2, leftIfLargestFails: 0.5, largest: 'Air pump' });
	});

	it('leaves no water moving with one pump', () => {
		expect(redundancy([device({ name: 'Pump', category: 'water-pump', power: { watts: 750 } })])).toEqual([
			{ duty: 'water', units: 1, leftIfLargestFails: 0, largest: 'Pump' }
		]);
	});

	it('counts the largest unit as the worst failure, across rows of one duty', () => {
		const rows = redundancy([
			device({ name: 'Small pump', category: 'water-pump', quantity: 2, power: { watts: 100 } }),
			device({ name: 'Big pump', category: 'water-pump', power: { watts: 200 } }),
			device({ name: 'Diffuser blower', category: 'aerator', power: { watts: 400 } })
		]);
		expect(rows).toEqual([
			{ duty: 'water', units: 3, leftIfLargestFails: 0.5, largest: 'Big pump' },
			{ duty: 'air', units: 1, leftIfLargestFails: 0, largest: 'Diffuser blower' }
		]);
	});

	it('takes amps × volts × power factor as the unit power', () => {
		const [row] = redundancy([
			device({ name: 'A', category: 'heater', power: { amps: 10, volts: 100, powerFactor: 1 } }),
			device({ name: 'B', category: 'heater', power: { watts: 3000 } })
		]);
		expect(row?.leftIfLargestFails).toBeCloseTo(1000 / 4000, 12);
	});

	it('leaves controls and other devices out', () => {
		expect(
			redundancy([device({ name: 'Controller', category: 'controls' }), device({ name: 'Misc' })])
		).toEqual([]);
	});
});
