import { describe, expect, it } from 'vitest';
import { airlift, type AirliftInput } from './airlift';

const example: AirliftInput = {
	riserInnerDiameterM: 0.025,
	submergenceM: 0.7,
	liftM: 0.3,
	temperatureC: 20,
	salinityGPerKg: 0,
	altitudeM: 0,
	efficiencyPercent: 30,
	waterFlowLpm: 20
};

describe('the air an air-lift needs (Nicklin 1963, as restated by Kassab et al. 2009, Eq. 23)', () => {
	it('needs about 29.5 L/min of free air to lift 20 L/min by 0.3 m from 0.7 m deep at 30 %', () => {
		// The worked example, derived from the equation: ρ 998.2 kg/m³ (EOS-80 at 20 °C),
		// Q_a = ρ·g·Q_w·h / (η·p_a·ln(p_in/p_a)) = 0.9789 W / (0.3 · 101,325 Pa · 0.06544) = 4.92e-4 m³/s.
		const result = airlift(example);
		expect(result.airFlowLpm).toBeCloseTo(29.5, 1);
		expect(result.injectionPressureKPa).toBeCloseTo(6.85, 2); // ρ·g·H_s, derived; "about 6.9 kPa" in the issue
		expect(result.submergenceRatio).toBeCloseTo(0.7, 10);
		expect(result.airToWaterRatio).toBeCloseTo(1.476, 3);
		expect(result.hydraulicWatts).toBeCloseTo(0.979, 3); // ρ·g·Q·h, derived
		// By the definition of the efficiency, the air's isothermal power is the water's power ÷ η.
		expect(result.isothermalAirWatts).toBeCloseTo(result.hydraulicWatts / 0.3, 6);
		expect(result.warnings).toEqual([]);
	});

	it('gives the same water back from that air (the equation inverted)', () => {
		const back = airlift({ ...example, waterFlowLpm: undefined, airFlowLpm: 29.527 });
		expect(back.waterFlowLpm).toBeCloseTo(20, 2);
	});

	it('needs a little more free air at altitude, where a litre of it carries less work', () => {
		// Derived from the equation: at 1,500 m p_a ≈ 84.6 kPa, so p_a·ln(p_in/p_a) shrinks less than
		// in proportion and the free air needed rises a little.
		expect(airlift({ ...example, altitudeM: 1500 }).airFlowLpm).toBeGreaterThan(29.5);
	});
});

describe('the rules of the trade (Stenning & Martin 1968)', () => {
	it('warns when less than 60 % of the riser is under water', () => {
		const shallow = airlift({ ...example, submergenceM: 0.4, liftM: 0.4 });
		expect(shallow.warnings.map((w) => w.code)).toContain('low-submergence');
		expect(shallow.warnings[0]?.message).toMatch(/50 % of the riser is under water/);
	});

	it('warns when the air is far from one to two times the water', () => {
		const wasteful = airlift({ ...example, efficiencyPercent: 10, liftM: 0.6, submergenceM: 1 });
		expect(wasteful.airToWaterRatio).toBeGreaterThan(4);
		expect(wasteful.warnings.map((w) => w.code)).toContain('air-to-water');
	});

	it('warns when the water wanted is more than the riser can carry', () => {
		const narrow = airlift({ ...example, riserInnerDiameterM: 0.0127 });
		expect(narrow.maxWaterFlowLpm).toBeLessThan(20);
		expect(narrow.warnings.map((w) => w.code)).toContain('beyond-riser');
	});

	it('uses the riser model, not an efficiency, when there is no lift', () => {
		const circulating = airlift({ ...example, liftM: 0 });
		expect(circulating.warnings.map((w) => w.code)).toEqual(['circulation-only']);
		expect(circulating.airFlowLpm).toBeGreaterThan(0);
		expect(Number.isFinite(circulating.airFlowLpm)).toBe(true);
	});
});
