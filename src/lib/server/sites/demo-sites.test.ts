import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { airDesignSchema, designAir, designConditions, scenarioDelivery, siteWaterSchema } from '$lib/calc';
import { deliveryDevice } from '$lib/compare/delivery-device';
import { siteSchema } from '$lib/forms/site.schema';
import type { DeviceSpec } from '$lib/server/db/schema';
import { deviceSpecSchema } from './device-specs';

const demo = JSON.parse(readFileSync('data/demo-sites.json', 'utf8'));
const tariffIds = new Set(
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')).tariffs.map((t: { id: string }) => t.id)
);

describe('the invented demo sites', () => {
	it('are marked as invented and each has exactly one baseline', () => {
		expect(demo.note).toMatch(/invented/i);
		for (const site of demo.sites) {
			expect(site.name).toMatch(/\(demo\)/);
			expect(site.scenarios.filter((s: { isBaseline: boolean }) => s.isBaseline)).toHaveLength(1);
		}
	});

	it('use tariffs of the demo library and valid site fields', () => {
		for (const { scenarios: _s, id: _id, ...site } of demo.sites) {
			expect(tariffIds.has(site.tariffId)).toBe(true);
			expect(
				siteSchema.safeParse({
					...site,
					supplyVolts: String(site.supplyVolts),
					supplyPhases: String(site.supplyPhases)
				}).success
			).toBe(true);
		}
	});

	it('hold devices the equipment schema accepts', () => {
		for (const site of demo.sites)
			for (const scenario of site.scenarios)
				for (const device of scenario.devices)
					expect(deviceSpecSchema.safeParse(device).error?.issues ?? []).toEqual([]);
	});
});

describe('the invented demo farm of issue 18', () => {
	const farm = demo.sites.find((s: { id: string }) => s.id === '5e7e0000-0000-4000-8000-000000000004');
	type Scenario = {
		name: string;
		airDesign?: unknown;
		devices: (DeviceSpec & { fromAirDesign?: boolean })[];
	};

	it('has tanks with stock and an altitude, and a saved air design on each scenario', () => {
		const water = siteWaterSchema.parse(farm.water);
		expect(water.altitudeM).toBeGreaterThan(0);
		expect(water.tanks.length).toBeGreaterThanOrEqual(2);
		expect(water.tanks.some((t) => t.feedKgPerDay > 0 && t.fishKg > 0)).toBe(true);
		for (const scenario of farm.scenarios as Scenario[])
			expect(airDesignSchema.safeParse(scenario.airDesign).error?.issues ?? []).toEqual([]);
	});

	it('compares a large in-tank pump against a small pump with air-lifts and two small air pumps', () => {
		const [baseline, proposal] = farm.scenarios as Scenario[];
		const waterPumps = (s: Scenario) => s.devices.filter((d) => d.category === 'water-pump');
		expect(waterPumps(baseline!).every((d) => d.inWater)).toBe(true);
		expect(proposal!.devices.some((d) => d.inWater)).toBe(false);
		expect(waterPumps(baseline!)[0]?.waterLpm).toBeGreaterThan(waterPumps(proposal!)[0]?.waterLpm ?? 0);
		expect(airDesignSchema.parse(proposal!.airDesign).airlifts.length).toBeGreaterThan(0);
		const airPumps = proposal!.devices.filter((d) => d.category === 'air-pump');
		expect(airPumps.reduce((sum, d) => sum + (d.quantity ?? 1), 0)).toBe(2);
	});

	it('holds the air pumps the designer gives for each design: count, watts and air (derived from designAir)', () => {
		const water = siteWaterSchema.parse(farm.water);
		for (const scenario of farm.scenarios as Scenario[]) {
			const design = airDesignSchema.parse(scenario.airDesign);
			const result = designAir(design, designConditions(water, design.aeration?.tankId ?? null));
			expect(result.warnings).toEqual([]);
			const pumps = scenario.devices.filter((d) => d.fromAirDesign);
			expect(pumps).toHaveLength(1);
			const [pump] = pumps;
			expect(pump?.quantity).toBe(result.pump?.count);
			expect(pump?.power).toEqual({ watts: result.pump?.wattsEach });
			expect(pump?.airLpm).toBeCloseTo(result.pump?.flowEachLpm ?? 0, 1);
			// The design's air is covered by the pumps, so the scenario supplies its design's oxygen.
			const delivery = scenarioDelivery(scenario.devices.map(deliveryDevice), design, water);
			expect(delivery.oxygenSuppliedGramsPerHour).toBeCloseTo(result.oxygenSuppliedGramsPerHour, 6);
			expect(delivery.oxygenSuppliedGramsPerHour!).toBeGreaterThanOrEqual(delivery.oxygenDemandGramsPerHour!);
		}
	});
});
