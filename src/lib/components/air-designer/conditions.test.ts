import { describe, expect, it } from 'vitest';
import { EMPTY_SITE_WATER, oxygenDemandGramsPerHour, type AirDesign, type SiteWater } from '$lib/calc';
import { blankConditions, checkConditions, siteConditions, TANK_GONE } from './conditions';

describe("the public page's water", () => {
	it('is fresh water at 20 °C at sea level with no demand when nothing is changed', () => {
		expect(checkConditions(blankConditions())).toEqual({
			conditions: {
				temperatureC: 20,
				salinityGPerKg: 0,
				altitudeM: 0,
				oxygenDemandGramsPerHour: null,
				tankVolumeLiters: null
			},
			issues: []
		});
	});

	it('takes sea water as 35 g/kg of salt (the core’s sea water)', () => {
		expect(checkConditions({ ...blankConditions(), water: 'sea' }).conditions?.salinityGPerKg).toBe(35);
	});

	it("works the demand out with the core's rule, from the feed or given in grams an hour", () => {
		const feed = checkConditions({
			...blankConditions(),
			demand: 'feed',
			feedKgPerDay: 2,
			proteinPercent: 40
		});
		expect(feed.conditions?.oxygenDemandGramsPerHour).toBe(
			oxygenDemandGramsPerHour({ feedKgPerDay: 2, proteinPercent: 40 })
		);
		const given = checkConditions({ ...blankConditions(), demand: 'direct', oxygenGramsPerHour: 12 });
		expect(given.conditions?.oxygenDemandGramsPerHour).toBe(12);
	});

	it('names each problem at its box, and ignores the boxes of a demand not chosen', () => {
		expect(checkConditions({ ...blankConditions(), temperatureC: 45, feedKgPerDay: 'x' }).issues).toEqual([
			{ path: 'temperatureC', message: 'Water temperature must be at most 40' }
		]);
		expect(checkConditions({ ...blankConditions(), demand: 'feed', feedKgPerDay: 'x' }).issues).toEqual([
			{ path: 'feedKgPerDay', message: 'Daily feed must be a number' }
		]);
	});
});

describe("a scenario's water", () => {
	const water: SiteWater = {
		altitudeM: 1200,
		tanks: [
			{
				id: 'tank-1',
				name: 'Grow-out tank (invented)',
				volumeLiters: 4000,
				depthM: 1.2,
				water: 'fresh',
				temperatureC: 26,
				monthlyTemperatureC: null,
				fishKg: 60,
				feedKgPerDay: 1.2,
				proteinPercent: 35
			}
		]
	};
	const aerating = (tankId: string | null) => ({ aeration: { tankId } }) as AirDesign;

	it('is the aerated tank’s water at the site’s altitude', () => {
		const { conditions } = siteConditions(water, aerating('tank-1'));
		expect(conditions).toMatchObject({ temperatureC: 26, altitudeM: 1200 });
	});

	it('names a tank that is no longer at the site, at the tank’s field', () => {
		expect(siteConditions(EMPTY_SITE_WATER, aerating('gone')).issues).toEqual([
			{ path: 'aeration.tankId', message: TANK_GONE }
		]);
	});
});
