import { describe, expect, it } from 'vitest';
import type { AirPump } from './air-design.schema';
import { adiabaticAirWatts, choosePumps, isothermalAirWatts, pumpFlowLpm } from './air-pump';
import { TYPICAL_AIR_PUMPS } from './typical-air-pumps';

const sixtyClass = TYPICAL_AIR_PUMPS.find((p) => p.id === 'linear-60')!.pump;

describe('the power in compressed air (Couper, Penney & Fair, Chemical Process Equipment)', () => {
	it('is about 9.54 W isothermal for 60 L/min of free air at 10 kPa gauge', () => {
		// The check: 101,325 Pa · 0.001 m³/s · ln(111,325 / 101,325) = 9.537 W.
		expect(isothermalAirWatts(60, 10)).toBeCloseTo(9.537, 3);
	});

	it('is a little more adiabatic: under 3 % more up to 20 kPa, about 4 % at 30 kPa (derived from the two equations)', () => {
		expect(adiabaticAirWatts(60, 30) / isothermalAirWatts(60, 30)).toBeCloseTo(1.038, 3);
		for (const kPa of [5, 10, 20]) {
			const ratio = adiabaticAirWatts(60, kPa) / isothermalAirWatts(60, kPa);
			expect(ratio).toBeGreaterThan(1);
			expect(ratio).toBeLessThan(1.03);
		}
	});

	it('is nothing at no pressure or no flow', () => {
		expect(isothermalAirWatts(60, 0)).toBe(0);
		expect(isothermalAirWatts(0, 10)).toBe(0);
	});
});

describe("a pump's curve, read as a table", () => {
	// The 60 L/min class's points come from a published septic-aerator sizing table (AIR-AND-WATER.md):
	// 68 L/min at 9.7 kPa, 62 at 13.8, 51 at 20.7.
	it.each([
		[9.7, 68],
		[13.8, 62],
		[20.7, 51],
		[11.75, 65] // halfway between the two points, linear (derived)
	])('gives %f kPa → %f L/min', (kPa, lpm) => {
		expect(pumpFlowLpm(sixtyClass, kPa)).toBeCloseTo(lpm, 6);
	});

	it('refuses to extrapolate past the last point', () => {
		expect(pumpFlowLpm(sixtyClass, 25)).toBeNull();
		expect(choosePumps(sixtyClass, 50, 25)).toBeNull();
	});

	it('is not a straight line through zero flow', () => {
		// Half the rated pressure does not give twice the rated flow's fall (common practice for linear pumps).
		expect(pumpFlowLpm(sixtyClass, 10)! / pumpFlowLpm(sixtyClass, 20)!).toBeLessThan(1.4);
	});
});

describe('choosing pumps for the air needed', () => {
	it('takes two 60 L/min-class pumps for 120 L/min at 12 kPa, at the data sheet watts', () => {
		const choice = choosePumps(sixtyClass, 120, 12)!;
		expect(choice.count).toBe(2);
		expect(choice.flowEachLpm).toBeCloseTo(64.634, 3); // 68 − 6 × (2.3 / 4.1), derived
		expect(choice.wattsTotal).toBe(2 * sixtyClass.inputWatts!);
		expect(choice.wattsFrom).toBe('data-sheet');
	});

	it('takes one pump when one is exactly enough', () => {
		expect(choosePumps(sixtyClass, 68, 9.7)!.count).toBe(1);
	});

	it('draws the isothermal power over the wire-to-air efficiency when the data sheet gives no watts', () => {
		// One data sheet: 40 L/min at 40 W near 13 kPa ≈ 20 % wire-to-air (AIR-AND-WATER.md).
		const pump: AirPump = {
			name: 'Data-sheet pump',
			points: [
				{ pressureKPa: 0, airLpm: 45 },
				{ pressureKPa: 13, airLpm: 40 }
			],
			inputWatts: null,
			wireToAirPercent: 20
		};
		const choice = choosePumps(pump, 40, 13)!;
		expect(choice.wattsEach).toBeCloseTo(isothermalAirWatts(40, 13) / 0.2, 9);
		expect(choice.wattsEach).toBeGreaterThan(35);
		expect(choice.wattsEach).toBeLessThan(45);
		expect(choice.wattsFrom).toBe('efficiency');
	});
});
