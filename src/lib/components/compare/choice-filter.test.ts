import { describe, expect, it } from 'vitest';
import {
	type ChoiceSite,
	SITES_AT_ONCE,
	boundChoices,
	bySite,
	findChoices,
	wordsOf,
	foundWords,
	pickedChoices,
	sitesShown
} from './choice-filter';

// Invented sites and scenarios, named the way the demo and the generated benchmark workspace name theirs.
const site = (n: number, name = `Bench site ${String(n).padStart(3, '0')} (generated)`): ChoiceSite => ({
	id: `site-${n}`,
	name,
	scenarios: [
		{ id: `s-${n}-a`, name: 'Installed now', isBaseline: true },
		{ id: `s-${n}-b`, name: 'Smaller pump', isBaseline: false },
		{ id: `s-${n}-c`, name: 'LED lights', isBaseline: false }
	]
});
const adviser = Array.from({ length: 200 }, (_, i) => site(i + 1));
const demo = [site(1, 'Alder Creek Trout Hatchery (demo)'), site(2, 'Rivière Greenhouse (demo)')];

describe('the compare chooser’s search', () => {
	it('keeps every site for an empty or blank search', () => {
		expect(findChoices(adviser, '')).toBe(adviser);
		expect(findChoices(adviser, '   ')).toBe(adviser);
	});

	it('finds a site by its name with all its scenarios', () => {
		const found = findChoices(adviser, 'site 017');
		expect(found.map((s) => s.name)).toEqual(['Bench site 017 (generated)']);
		expect(found[0]!.scenarios).toHaveLength(3);
	});

	it('finds scenarios by the start of a word of their name at every site, and only those', () => {
		const found = findChoices(adviser, 'led');
		expect(found).toHaveLength(200);
		expect(found.every((s) => s.scenarios.length === 1 && s.scenarios[0]!.name === 'LED lights')).toBe(true);
	});

	it('needs every word, in the site’s name or the scenario’s, in any order and case', () => {
		const found = findChoices(demo, 'PUMP alder');
		expect(found.map((s) => s.scenarios.map((c) => c.name))).toEqual([['Smaller pump']]);
		expect(findChoices(demo, 'alder heater')).toEqual([]);
		// Inside a word is not a match: "led" is not in "Installed", "reek" not in "Creek".
		expect(findChoices(demo, 'reek')).toEqual([]);
	});

	it('folds case, accents and punctuation, so “riviere  greenhouse” finds “Rivière Greenhouse”', () => {
		expect(wordsOf('  Rivière   Greenhouse (demo)')).toEqual(['riviere', 'greenhouse', 'demo']);
		expect(findChoices(demo, 'riviere  greenhouse').map((s) => s.id)).toEqual(['site-2']);
	});

	it('does not change the sites it was given', () => {
		findChoices(demo, 'pump');
		expect(demo[0]!.scenarios).toHaveLength(3);
	});
});

describe('what the chooser lists and says', () => {
	it('lists every site up to twenty, then twenty at a time', () => {
		expect(SITES_AT_ONCE).toBe(20);
		expect(sitesShown(3, SITES_AT_ONCE)).toBe(3);
		expect(sitesShown(20, SITES_AT_ONCE)).toBe(20);
		expect(sitesShown(200, SITES_AT_ONCE)).toBe(20);
		expect(sitesShown(200, 40)).toBe(40);
		// An address's `shown` is rounded up to whole steps, and nonsense lists the first step.
		expect(sitesShown(200, 25)).toBe(40);
		expect(sitesShown(200, NaN)).toBe(20);
		expect(sitesShown(200, -5)).toBe(20);
		expect(sitesShown(30, 1000)).toBe(30);
	});

	it('keeps the picked scenarios in the order picked, with their sites, whatever the search', () => {
		const picked = pickedChoices(adviser, ['s-150-b', 'unknown', 's-3-a', 's-150-b']);
		expect(picked.map((p) => `${p.name} · ${p.siteName}`)).toEqual([
			'Smaller pump · Bench site 150 (generated)',
			'Installed now · Bench site 003 (generated)'
		]);
	});

	it('says how many scenarios at how many sites match, or that none does', () => {
		expect(foundWords('', adviser)).toBe('');
		expect(foundWords('led', findChoices(adviser, 'led'))).toBe('200 scenarios at 200 sites match “led”.');
		expect(foundWords('site 017 led', findChoices(adviser, 'site 017 led'))).toBe(
			'1 scenario at 1 site matches “site 017 led”.'
		);
		expect(foundWords('heater', findChoices(adviser, 'heater'))).toBe(
			'No site or scenario matches “heater”.'
		);
	});
});

describe('the list the server sends', () => {
	const nothing = { find: '', picked: [] };

	it('sends every site when the scenarios fit the bound, as 200 sites × 3 do under 1,000', () => {
		expect(boundChoices(adviser, nothing, 1000)).toEqual({ sites: adviser, left: 0 });
	});

	it('past the bound sends whole sites in order, and says how many scenarios it left out', () => {
		const sent = boundChoices(adviser, nothing, 100);
		expect(sent.sites.map((s) => s.id)).toEqual(adviser.slice(0, 33).map((s) => s.id));
		expect(sent.left).toBe(600 - 99);
	});

	it('sends the picked scenarios’ sites and those a search finds first, still in the sites’ order', () => {
		const sent = boundChoices(adviser, { find: 'site 19', picked: ['s-150-b'] }, 30);
		// Site 150 (picked), then those of 190–199 that answer "site 19" while whole sites fit (not 019:
		// a word typed begins a word).
		expect(sent.sites.map((s) => s.name.slice(0, 14))).toEqual([
			'Bench site 150',
			...Array.from({ length: 9 }, (_, i) => `Bench site 19${i}`)
		]);
		expect(sent.left).toBe(600 - 30);
	});

	it('an address full of ids sends the sites of the first twenty only', () => {
		const picked = adviser.map((s) => s.scenarios[0]!.id);
		expect(boundChoices(adviser, { find: '', picked }, 30).sites).toHaveLength(20);
	});
});

describe('grouping the readable scenarios by site', () => {
	it('keeps two sites of the same name apart, whose rows interleave when sorted by name', () => {
		const row = (siteId: string, id: string) => ({
			id,
			name: `Scenario ${id}`,
			isBaseline: false,
			siteId,
			siteName: 'Matrix test site (invented)'
		});
		const sites = bySite([row('x', '1'), row('y', '2'), row('x', '3'), row('y', '4')]);
		expect(sites.map((s) => [s.id, s.scenarios.map((c) => c.id)])).toEqual([
			['x', ['1', '3']],
			['y', ['2', '4']]
		]);
	});
});
