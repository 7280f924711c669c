import { describe, expect, it } from 'vitest';
import { aeration, type AerationInput } from './aeration';
import { fieldToStandardRatio, oxygenDemandGramsPerHour, oxygenFromAir } from './oxygen-transfer';

const clean = {
	temperatureC: 20,
	salinityGPerKg: 0,
	altitudeM: 0,
	targetDoMgL: 2,
	diffuserDepthM: 1,
	alpha: 1,
	beta: 1,
	fouling: 1,
	theta: 1.024,
	depthCorrection: 0
};

describe('the field-to-standard transfer ratio (Metcalf & Eddy, Wastewater Engineering, 5th ed.)', () => {
	it('is 0.780 for clean water at 20 °C, sea level, α = β = F = 1 and 2 mg/L', () => {
		// The check: (9.092 − 2) / 9.092.
		expect(fieldToStandardRatio(clean).ratio).toBeCloseTo(0.78, 3);
	});

	it('falls with α, fouling, altitude and warmth, and with a higher target', () => {
		const base = fieldToStandardRatio(clean).ratio;
		expect(fieldToStandardRatio({ ...clean, alpha: 0.8 }).ratio).toBeCloseTo(base * 0.8, 10);
		expect(fieldToStandardRatio({ ...clean, fouling: 0.9 }).ratio).toBeCloseTo(base * 0.9, 10);
		expect(fieldToStandardRatio({ ...clean, altitudeM: 1500 }).ratio).toBeLessThan(base);
		expect(fieldToStandardRatio({ ...clean, targetDoMgL: 5 }).ratio).toBeLessThan(base);
		// θ^(T−20) with θ = 1.024 raises the transfer coefficient at 28 °C by 1.024⁸ = 1.209 while the
		// saturation falls from 9.09 to 7.83 mg/L (Benson & Krause): (7.83 − 2)·1.209 / 9.092 = 0.775 (derived).
		expect(fieldToStandardRatio({ ...clean, temperatureC: 28 }).ratio).toBeCloseTo(0.775, 2);
	});

	it('gains a little from the saturation at mid-depth', () => {
		expect(fieldToStandardRatio({ ...clean, depthCorrection: 0.4 }).ratio).toBeGreaterThan(0.78);
	});
});

describe("the stock's oxygen demand (Timmons & Ebeling, Recirculating Aquaculture)", () => {
	it('is 0.25 kg per kg of feed for the fish plus 4.57 g per g of ammonia-N, ammonia-N = feed × protein × 0.092', () => {
		// 10 kg/day at 35 % protein: 2.5 + 10 · 0.35 · 0.092 · 4.57 = 3.9715 kg/day = 165.48 g/h (derived).
		expect(oxygenDemandGramsPerHour({ feedKgPerDay: 10, proteinPercent: 35 })).toBeCloseTo(165.48, 2);
	});

	it('takes a demand given directly', () => {
		expect(oxygenDemandGramsPerHour({ oxygenGramsPerHour: 42 })).toBe(42);
	});
});

describe('oxygen carried by air', () => {
	it('puts 277.6 g of oxygen in each cubic metre of standard air (20.95 % by volume, 20 °C, 1 atm)', () => {
		// 1 m³/h = 16.667 L/min through a diffuser of 100 % transfer, ratio 1.
		expect(oxygenFromAir(1000 / 60, 1, 100, 1, 1).standardGramsPerHour).toBeCloseTo(277.6, 6);
	});
});

const fishTank: AerationInput = {
	...clean,
	targetDoMgL: 5,
	alpha: 0.9,
	beta: 0.98,
	fouling: 0.9,
	depthCorrection: 0.4,
	temperatureC: 26,
	transferPercentPerM: 6,
	extraPressureKPa: 2,
	wireToAirPercent: 25,
	demand: { oxygenGramsPerHour: 100 }
};

describe('aeration for a demand', () => {
	it('carries the standard transfer needed in standard air through the diffusers', () => {
		const result = aeration(fishTank);
		expect(result.standardTransferGramsPerHour).toBeCloseTo(100 / result.fieldToStandardRatio, 9);
		// Derived: air (m³/h) = SOTR / (277.6 g/m³ × 6 %), at sea level free air = standard air.
		expect(result.airFlowLpm).toBeCloseTo(
			((result.standardTransferGramsPerHour / (277.6 * 0.06)) * 1000) / 60,
			9
		);
		expect(result.pressureKPa).toBeCloseTo(9.775 + 2, 3); // ρ·g·1 m at 26 °C (996.78 kg/m³, EOS-80) + losses
		expect(result.inputWatts).toBeCloseTo(result.isothermalAirWatts / 0.25, 9);
	});

	it('lands near 1 kg O₂ per kWh for diffused air in shallow water (Boyd 1998, Aquacultural Engineering 18:9)', () => {
		for (const transferPercentPerM of [2.5, 6]) {
			const { kgO2PerKwh } = aeration({ ...fishTank, transferPercentPerM });
			expect(kgO2PerKwh).toBeGreaterThan(0.4);
			expect(kgO2PerKwh).toBeLessThan(1.6);
		}
	});

	it('says so when the target is above what the water can hold', () => {
		const result = aeration({ ...fishTank, targetDoMgL: 12 });
		expect(result.warnings.map((w) => w.code)).toEqual(['target-above-saturation']);
		expect(result.airFlowLpm).toBe(0);
	});
});
