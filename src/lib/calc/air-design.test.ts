import { describe, expect, it } from 'vitest';
import { airDesignSchema, type AirDesignInput } from './air-design.schema';
import { designAir } from './air-design';
import { designConditions } from './design-conditions';
import type { SiteWater } from './site-water.schema';
import { TYPICAL_AIR_PUMPS } from './typical-air-pumps';

const sixtyClass = TYPICAL_AIR_PUMPS.find((p) => p.id === 'linear-60')!.pump;

const exampleLift = {
	name: 'Grow-bed lift',
	count: 2,
	riserInnerDiameter: 25,
	riserInnerDiameterUnit: 'mm',
	submergence: 0.7,
	submergenceUnit: 'm',
	lift: 0.3,
	liftUnit: 'm',
	waterFlow: 20,
	waterFlowUnit: 'lpm'
} as const;

const design = (input: Partial<AirDesignInput> = {}) =>
	airDesignSchema.parse({ airlifts: [exampleLift], pump: sixtyClass, ...input });

const water: SiteWater = {
	altitudeM: 0,
	tanks: [
		{
			id: 'a',
			name: 'Fish tank',
			volumeLiters: 1000,
			depthM: 1,
			water: 'fresh',
			temperatureC: 24,
			monthlyTemperatureC: null,
			fishKg: 40,
			feedKgPerDay: 0.8,
			proteinPercent: 35
		},
		{
			id: 'b',
			name: 'Sump',
			volumeLiters: 300,
			depthM: 0.6,
			water: 'fresh',
			temperatureC: 26,
			monthlyTemperatureC: null,
			fishKg: 0,
			feedKgPerDay: 0,
			proteinPercent: 35
		}
	]
};

describe("a site's conditions for a design", () => {
	it('uses fresh water at 20 °C and no demand when there are no tanks', () => {
		expect(designConditions({ altitudeM: 300, tanks: [] }, null)).toEqual({
			temperatureC: 20,
			salinityGPerKg: 0,
			altitudeM: 300,
			oxygenDemandGramsPerHour: null,
			tankVolumeLiters: null
		});
	});

	it("takes the warmest tank's water and all the stock's demand for the whole site", () => {
		const all = designConditions(water, null);
		expect(all.temperatureC).toBe(26);
		expect(all.tankVolumeLiters).toBe(1300);
		// 0.8 kg/day at 35 %: (0.2 + 0.8·0.35·0.092·4.57) kg/day = 13.24 g/h (Timmons & Ebeling figures, derived).
		expect(all.oxygenDemandGramsPerHour).toBeCloseTo(13.24, 2);
	});

	it("takes one tank's month when the tank gives monthly temperatures, and sea water's salt", () => {
		const monthly: SiteWater = {
			altitudeM: 0,
			tanks: [
				{
					...water.tanks[0]!,
					water: 'sea',
					monthlyTemperatureC: [18, 18, 19, 20, 22, 24, 27, 27, 25, 22, 20, 18]
				}
			]
		};
		const july = designConditions(monthly, 'a', 6);
		expect(july.temperatureC).toBe(27);
		expect(july.salinityGPerKg).toBe(35);
	});
});

describe('designing the air side', () => {
	it('adds the air of two worked-example air-lifts and chooses one 60 L/min-class pump', () => {
		const result = designAir(design(), designConditions({ altitudeM: 0, tanks: [] }, null));
		// Derived: 2 × 29.53 L/min (Nicklin, the worked example); pressure 6.85 kPa + 2 kPa of line loss;
		// the 60 L/min class gives 76 − 8 × 8.85 / 9.7 = 68.7 L/min there.
		expect(result.totalAirLpm).toBeCloseTo(59.05, 1);
		expect(result.waterLpm).toBeCloseTo(40, 9);
		expect(result.pressureKPa).toBeCloseTo(8.85, 2);
		expect(result.pump).toMatchObject({ count: 1, wattsEach: 50 });
		expect(result.pump!.flowEachLpm).toBeCloseTo(68.7, 1);
		expect(result.oxygenSuppliedGramsPerHour).toBeGreaterThan(0);
	});

	it('adds the aeration for the stock and takes the deepest outlet for the pressure', () => {
		const aerated = design({
			aeration: { tankId: 'a', diffuser: 'fine', diffuserDepth: 1, diffuserDepthUnit: 'm' }
		});
		const result = designAir(aerated, designConditions(water, 'a'));
		expect(result.aeration!.oxygenDemandGramsPerHour).toBeCloseTo(13.24, 2);
		expect(result.totalAirLpm).toBeCloseTo(result.airlifts[0]!.totalAirLpm + result.aeration!.airFlowLpm, 9);
		expect(result.pressureKPa).toBeCloseTo(result.aeration!.pressureKPa, 9); // 1 m is deeper than 0.7 m
		// The diffusers meet the demand exactly; the air-lifts' bubbles add some more.
		expect(result.oxygenSuppliedGramsPerHour).toBeGreaterThan(13.24);
	});

	it('says so when the pump cannot reach the pressure', () => {
		const aquarium = TYPICAL_AIR_PUMPS.find((p) => p.id === 'aquarium-5')!.pump;
		const deep = design({ pump: aquarium, airlifts: [{ ...exampleLift, submergence: 1.5 }] });
		const result = designAir(deep, designConditions({ altitudeM: 0, tanks: [] }, null));
		expect(result.pump).toBeNull();
		expect(result.warnings.map((w) => w.code)).toContain('pump-cannot-reach');
	});

	it('names the air-lift in its warnings', () => {
		const narrow = design({ airlifts: [{ ...exampleLift, riserInnerDiameter: 12 }] });
		const result = designAir(narrow, designConditions({ altitudeM: 0, tanks: [] }, null));
		expect(result.warnings.find((w) => w.code === 'beyond-riser')?.message).toMatch(/^Grow-bed lift: /);
	});
});
