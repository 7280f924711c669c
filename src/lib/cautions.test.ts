import { describe, expect, it } from 'vitest';
import { asksInWater, hasMainsInWater, hasOutdoorCircuit, needsElectricalCaution } from './cautions';

// Common practice, cited from memory: ground-fault protection (GFCI, US NEC 210.8; RCD, IEC
// 60364-7-702) for mains equipment in or near water and for outdoor receptacles and circuits.
describe('electrical cautions (common practice: GFCI/RCD near water and outdoors, NEC 210.8 / IEC 60364-7-702, from memory)', () => {
	const inWaterPump = { category: 'water-pump', inWater: true };
	const outdoorLight = { category: 'lighting', outdoor: true };

	it('names mains in water only for in-water categories marked as in water', () => {
		expect(hasMainsInWater([inWaterPump])).toBe(true);
		expect(hasMainsInWater([{ category: 'heater', inWater: true }])).toBe(true);
		expect(hasMainsInWater([{ category: 'uv', inWater: true }])).toBe(true);
		expect(hasMainsInWater([{ category: 'chiller', inWater: true }])).toBe(true);
		expect(hasMainsInWater([{ category: 'water-pump' }])).toBe(false);
		expect(hasMainsInWater([{ category: 'lighting', inWater: true }])).toBe(false);
	});

	it('does not call an outdoor device mains in water', () => {
		expect(hasMainsInWater([outdoorLight])).toBe(false);
		expect(hasMainsInWater([{ category: 'air-pump', outdoor: true }])).toBe(false);
	});

	it('names an outdoor circuit for any outdoor device, whatever its category', () => {
		expect(hasOutdoorCircuit([outdoorLight])).toBe(true);
		expect(hasOutdoorCircuit([{ outdoor: true }])).toBe(true);
		expect(hasOutdoorCircuit([inWaterPump])).toBe(false);
		expect(hasOutdoorCircuit([{ category: 'lighting', outdoor: false }])).toBe(false);
	});

	it('shows the electrical caution, whose words name both, for either one and not for neither', () => {
		expect(needsElectricalCaution([inWaterPump])).toBe(true);
		expect(needsElectricalCaution([outdoorLight])).toBe(true);
		expect(needsElectricalCaution([{ category: 'lighting' }, inWaterPump])).toBe(true);
		expect(needsElectricalCaution([{ category: 'lighting', inWater: true }])).toBe(false);
		expect(needsElectricalCaution([])).toBe(false);
	});
});

describe('the in-water question in an equipment row (common practice, no source)', () => {
	it('is asked of the kinds of device that usually sit in the water on mains power', () => {
		for (const category of ['water-pump', 'heater', 'uv', 'chiller'])
			expect(asksInWater(category)).toBe(true);
	});

	it('is not asked of devices that stay out of the water', () => {
		for (const category of ['air-pump', 'lighting', 'fan', 'controls', undefined])
			expect(asksInWater(category)).toBe(false);
	});

	it('turns the caution on at once when the answer is yes, and not for no', () => {
		expect(needsElectricalCaution([{ category: 'water-pump', inWater: true }])).toBe(true);
		expect(needsElectricalCaution([{ category: 'water-pump', inWater: false }])).toBe(false);
	});
});
