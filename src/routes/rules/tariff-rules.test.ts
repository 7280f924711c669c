import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import TariffRules from './TariffRules.svelte';

// The rules page states each rule of issue 19 as the core applies it (src/lib/calc/energy-charges.ts,
// demand-charges.ts, bill.ts, calculate.ts); a rule dropped from the page fails here.
describe('the rules page on the charges real tariffs use', () => {
	const body = render(TariffRules).body.replaceAll('&amp;', '&');

	it.each([
		['daily tiers', 'each bound is multiplied by the days of the billing period'],
		['tiers across periods', "count the billing period's kWh across all the season's periods together"],
		['sharing by kWh', "in proportion to each period's kWh"],
		['proration', "prorated by the share of the period's days that fall in its months"],
		['demand tiers', 'price the billing kW tier by tier'],
		[
			'other hours at weekends',
			'weekend days (and holidays the tariff prices as weekends) in its weekend windows, with one peak over both'
		],
		['ratchet months back', 'the given number of periods just before this'],
		['ratchet listed months', 'those of the 11 periods before whose month is listed'],
		['within the calculation', 'Only the billing periods of the same calculation count'],
		['ratchet across versions', "a new version's ratchet looks back on the months priced on the old one"],
		['ratchet shared cost', 'no device caused it and it is shared cost'],
		['yearly fixed', 'a per-year charge is a twelfth of its amount on each billing period'],
		['minimum per day', 'a minimum per day (× the days of the billing period)'],
		[
			'yearly minimum',
			'on each run of 12 billing periods from the start of the calculation (a shorter last run on n/12 of it)'
		],
		[
			'yearly minimum across versions',
			"each version's yearly minimum counts a twelfth for each of its billing periods"
		]
	])('states %s', (_, words) => {
		expect(body.replace(/\s+/g, ' ')).toContain(words);
	});
});
