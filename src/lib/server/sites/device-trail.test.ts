import { describe, expect, it } from 'vitest';
import type { DeviceSpec } from '../db/schema';
import { deviceTrail, onlyReordered } from './device-trail';

// Invented devices of a demo site (example figures, not measurements).
const pump: DeviceSpec = { name: 'Main water pump', power: { watts: 1500 }, schedule: { type: 'always' } };
const air: DeviceSpec = {
	name: 'Air pump',
	category: 'air-pump',
	power: { watts: 60 },
	schedule: { type: 'always' },
	inWater: false
};

describe('the trail of a saved equipment list', () => {
	it('records nothing for rows sent back untouched, whatever their key order', () => {
		const reordered = { schedule: { type: 'always' }, power: { watts: 1500 }, name: 'Main water pump' };
		expect(
			deviceTrail([pump, air], [reordered as DeviceSpec, { ...air, inWater: undefined }], 'USD')
		).toEqual([]);
	});

	it('records each changed field of the one device changed, old and new, in words', () => {
		const smaller: DeviceSpec = {
			...pump,
			power: { watts: 90 },
			schedule: { type: 'windows', windows: [{ start: '06:00', end: '18:00' }] }
		};
		const [entry, ...rest] = deviceTrail([pump, air], [smaller, air], 'USD');
		expect(rest).toEqual([]);
		expect(entry?.action).toBe('changed');
		expect(entry?.words).toBe(
			'Main water pump: power 1,500 W → 90 W; schedule Always on → On 06:00–18:00, every day'
		);
		expect(entry?.changes).toMatchObject({
			power: { from: { watts: 1500 }, to: { watts: 90 } },
			schedule: {
				from: { type: 'always' },
				to: { type: 'windows', windows: [{ start: '06:00', end: '18:00' }] }
			}
		});
	});

	it('names a renamed row by its old name and says what it is called now', () => {
		const [entry] = deviceTrail([pump], [{ ...pump, name: 'Small pump' }], 'USD');
		expect(entry?.words).toBe('Main water pump: name “Main water pump” → “Small pump”');
	});

	it('shows money with its currency', () => {
		const [entry] = deviceTrail([pump], [{ ...pump, purchaseCost: 800 }], 'USD');
		expect(entry?.words).toBe('Main water pump: purchase $0.00 → $800.00');
	});

	it('records added and removed devices, and a move as no change to a device', () => {
		expect(deviceTrail([pump], [air], 'USD').map((e) => e.words)).toEqual([
			'added Air pump',
			'removed Main water pump'
		]);
		expect(deviceTrail([pump, air], [air, pump], 'USD')).toEqual([]);
		expect(onlyReordered([pump, air], [air, pump])).toBe(true);
		expect(onlyReordered([pump, air], [pump, air])).toBe(false);
	});
});
