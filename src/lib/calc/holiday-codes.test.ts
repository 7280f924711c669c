import { describe, expect, it } from 'vitest';
import Holidays from 'date-holidays';
import { isKnownCountry, isKnownRegion } from './holiday-codes';
import regions from './holiday-regions.json';

describe('holiday calendar codes', () => {
	it('list exactly the countries and regions the installed date-holidays knows', () => {
		// After an upgrade of date-holidays: `node scripts/holiday-regions.mjs` writes the list again.
		const all = new Holidays();
		const countries = Object.keys(all.getCountries());
		expect(Object.keys(regions).sort()).toEqual(countries.sort());
		for (const country of countries) {
			const listed = regions[country as keyof typeof regions] as string[];
			expect(listed, country).toEqual(Object.keys(all.getStates(country) ?? {}).sort());
		}
	});

	it('know a country and its regions, and refuse what the package does not list', () => {
		expect(isKnownCountry('US')).toBe(true);
		expect(isKnownRegion('US', 'TX')).toBe(true);
		expect(isKnownCountry('XX')).toBe(false);
		expect(isKnownRegion('US', 'XX')).toBe(false);
		expect(isKnownRegion('XX', 'TX')).toBe(false);
		expect(isKnownCountry('toString')).toBe(false);
	});
});
