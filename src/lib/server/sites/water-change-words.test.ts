import { describe, expect, it } from 'vitest';
import type { SiteWater, Tank } from '$lib/calc';
import { waterChangeWords } from './water-change-words';

const growOut: Tank = {
	id: 'g1',
	name: 'Grow-out 1',
	volumeLiters: 1000,
	depthM: 1,
	water: 'fresh',
	temperatureC: 24,
	monthlyTemperatureC: null,
	fishKg: 40,
	feedKgPerDay: 0.8,
	proteinPercent: 35
};
const water = (tanks: Tank[], altitudeM = 0): SiteWater => ({ altitudeM, tanks });

describe('the change trail of a site’s water', () => {
	it('names a tank’s changed fields with the old and new value', () => {
		expect(
			waterChangeWords(water([growOut]), water([{ ...growOut, volumeLiters: 1200, depthM: 1.2 }]))
		).toEqual(["Tank 'Grow-out 1' volume 1,000 L → 1,200 L, depth 1 m → 1.2 m"]);
	});

	it('says which tanks were added and removed, and a rename as a rename', () => {
		const sump: Tank = { ...growOut, id: 's1', name: 'Sump' };
		const renamed = { ...growOut, name: 'Grow-out A' };
		expect(waterChangeWords(water([growOut]), water([renamed, sump], 250))).toEqual([
			'Altitude 0 m → 250 m',
			"Tank 'Grow-out 1' renamed 'Grow-out A'",
			"Added tank 'Sump'"
		]);
		expect(waterChangeWords(water([growOut, sump]), water([sump]))).toEqual(["Removed tank 'Grow-out 1'"]);
	});

	it('reads monthly temperatures, sea water and salinity in words', () => {
		const months = [10, 10, 12, 14, 18, 22, 26, 26, 22, 18, 14, 12];
		const after = { ...growOut, water: 'sea' as const, salinityGPerKg: 32, monthlyTemperatureC: months };
		expect(waterChangeWords(water([growOut]), water([after]))).toEqual([
			"Tank 'Grow-out 1' water fresh water → sea water, salinity the usual → 32 g/kg, monthly temperatures none → 10, 10, 12, 14, 18, 22, 26, 26, 22, 18, 14, 12 °C"
		]);
	});

	it('finds no change when only the order of keys differs (a jsonb round trip)', () => {
		const reordered = Object.fromEntries(Object.entries(growOut).reverse()) as Tank;
		expect(waterChangeWords(water([growOut]), { tanks: [reordered], altitudeM: 0 })).toEqual([]);
	});
});
