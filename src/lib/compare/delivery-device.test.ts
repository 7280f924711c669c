import { describe, expect, it } from 'vitest';
import { deliveryDevice } from './delivery-device';

describe('what the delivery view reads of a device', () => {
	it('takes an absent quantity as one unit (the equipment schema’s default)', () => {
		expect(deliveryDevice({ name: 'Pump', category: 'water-pump', waterLpm: 120 })).toEqual({
			name: 'Pump',
			category: 'water-pump',
			quantity: 1,
			waterLpm: 120
		});
	});

	it('leaves out a flow still being typed (not a number, negative) and keeps the in-water answer', () => {
		expect(
			deliveryDevice({
				name: 'Air pump',
				category: 'air-pump',
				quantity: 2,
				airLpm: Number.NaN,
				waterLpm: -1,
				inWater: false
			})
		).toEqual({ name: 'Air pump', category: 'air-pump', quantity: 2, inWater: false });
	});
});
