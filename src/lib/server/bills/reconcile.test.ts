import { describe, expect, it } from 'vitest';
import type { DeviceSpec } from '../db/schema';
import { scaledToBill } from './scale';

// Invented devices.
const pump: DeviceSpec = {
	name: 'Pump',
	category: 'water-pump',
	power: { watts: 500 },
	schedule: { type: 'always' }
};
const lights: DeviceSpec = {
	name: 'Lights',
	category: 'lighting',
	power: { watts: 200 },
	dutyPercent: 50,
	schedule: { type: 'always' }
};

describe('the list scaled to a bill’s kWh', () => {
	it('adds the missing kWh as an always-on load: 72 kWh over 720 hours is 100 W', () => {
		const scaled = scaledToBill([pump], 360, 432, 720);
		expect(scaled.at(-1)).toEqual({
			name: 'Load not in the list',
			category: 'other',
			power: { watts: 100 },
			schedule: { type: 'always' }
		});
	});

	it('scales every duty down when the list explains more than the bill', () => {
		const scaled = scaledToBill([pump, lights], 400, 300, 720);
		expect(scaled.map((s) => s.dutyPercent)).toEqual([75, 37.5]);
	});

	it('leaves the list alone when it matches the bill', () => {
		expect(scaledToBill([pump], 360, 360, 720)).toEqual([pump]);
	});
});
