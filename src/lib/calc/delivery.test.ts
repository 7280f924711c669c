import { describe, expect, it } from 'vitest';
import { airDesignSchema } from './air-design.schema';
import { designAir } from './air-design';
import { scenarioDelivery, type DeliveryDevice } from './delivery';
import { designConditions } from './design-conditions';
import type { SiteWater } from './site-water.schema';
import { TYPICAL_AIR_PUMPS } from './typical-air-pumps';

const water: SiteWater = {
	altitudeM: 0,
	tanks: [
		{
			id: 'a',
			name: 'Fish tank',
			volumeLiters: 2000,
			depthM: 1.2,
			water: 'fresh',
			temperatureC: 24,
			monthlyTemperatureC: null,
			fishKg: 60,
			feedKgPerDay: 1.2,
			proteinPercent: 35
		}
	]
};

const design = airDesignSchema.parse({
	airlifts: [
		{
			name: 'Bed lift',
			count: 2,
			riserInnerDiameter: 32,
			riserInnerDiameterUnit: 'mm',
			submergence: 0.9,
			submergenceUnit: 'm',
			lift: 0.3,
			liftUnit: 'm',
			waterFlow: 25,
			waterFlowUnit: 'lpm'
		}
	],
	aeration: { tankId: 'a', diffuser: 'fine', diffuserDepth: 1.1, diffuserDepthUnit: 'm' },
	pump: TYPICAL_AIR_PUMPS.find((p) => p.id === 'linear-60')!.pump
});
const designed = designAir(design, designConditions(water, 'a'));

const bigPump: DeliveryDevice = {
	name: 'Big pump',
	category: 'water-pump',
	quantity: 1,
	inWater: true,
	waterLpm: 150
};

describe('what a scenario with one big in-tank pump delivers', () => {
	const delivery = scenarioDelivery([bigPump], null, water);

	it('moves its flow and turns the tank over', () => {
		expect(delivery.waterLpm).toBe(150);
		expect(delivery.turnoversPerHour).toBeCloseTo(4.5, 9); // 150 × 60 / 2000 (derived)
	});

	it('counts its mains power in the water and loses all the water when it fails', () => {
		expect(delivery.mainsDevicesInWater).toBe(1);
		expect(delivery.ifLargestFails).toMatchObject({ waterLpm: 0, waterUnit: 'Big pump' });
	});

	it('does not know the oxygen without an air design', () => {
		expect(delivery.oxygenSuppliedGramsPerHour).toBeNull();
		expect(delivery.oxygenDemandGramsPerHour).toBeCloseTo(19.86, 2); // 1.2 kg/day at 35 % (Timmons & Ebeling figures)
	});
});

describe('what a small pump with air-lifts and two air pumps delivers', () => {
	const each = designed.totalAirLpm / 2;
	const devices: DeliveryDevice[] = [
		{ name: 'Small pump', category: 'water-pump', quantity: 1, inWater: true, waterLpm: 40 },
		{ name: 'Air pump', category: 'air-pump', quantity: 2, airLpm: each }
	];
	const delivery = scenarioDelivery(devices, design, water);

	it("adds the air-lifts' water to the pump's and supplies the design's oxygen", () => {
		expect(delivery.waterLpm).toBeCloseTo(40 + 50, 9);
		expect(delivery.oxygenSuppliedGramsPerHour).toBeCloseTo(designed.oxygenSuppliedGramsPerHour, 9);
		expect(delivery.oxygenSuppliedGramsPerHour!).toBeGreaterThan(delivery.oxygenDemandGramsPerHour!);
		expect(delivery.targetDoMgL).toBe(5);
	});

	it('keeps half the lifted water and oxygen when one of two equal air pumps fails', () => {
		// The small water pump loses 40 L/min; an air pump 25 L/min of lifted water: the pump is worse.
		expect(delivery.ifLargestFails).toMatchObject({
			waterLpm: 50,
			waterUnit: 'Small pump',
			oxygenUnit: 'Air pump'
		});
		expect(delivery.ifLargestFails.oxygenSuppliedGramsPerHour).toBeCloseTo(
			designed.oxygenSuppliedGramsPerHour / 2,
			9
		);
	});

	it('gains nothing from spare air until a pump fails (air beyond the design is bled off)', () => {
		const spare = scenarioDelivery(
			[{ name: 'Air pump', category: 'air-pump', quantity: 3, airLpm: each }],
			design,
			water
		);
		expect(spare.waterLpm).toBeCloseTo(50, 9);
		expect(spare.ifLargestFails.waterLpm).toBeCloseTo(50, 9);
		expect(spare.mainsDevicesInWater).toBe(0);
	});

	it("does not know the water when an air pump's air is not given", () => {
		const unknown = scenarioDelivery(
			[{ name: 'Air pump', category: 'air-pump', quantity: 2 }],
			design,
			water
		);
		expect(unknown.waterLpm).toBeNull();
		expect(unknown.oxygenSuppliedGramsPerHour).toBeNull();
	});
});
