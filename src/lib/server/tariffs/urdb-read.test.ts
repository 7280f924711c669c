import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { tariffSchema } from '$lib/calc';
import { REFUSED, readUrdbRate } from './urdb-read';
import { issueInWords, placeInWords } from './urdb-issue-words';

// The samples are public records of the OpenEI Utility Rate Database (tests/fixtures/urdb/README.md).
const fixture = (name: string) => JSON.parse(readFileSync(`tests/fixtures/urdb/${name}`, 'utf8'));
const rs1 = () => fixture('fpl-rs1-2015.json');
const georgia = () => fixture('georgia-power-tou-reo-2013.json');

describe('a rate the import can price', () => {
	it('reads FPL RS-1 as a tiered tariff whose first tier ends at 1,000 kWh', () => {
		const reading = readUrdbRate(rs1());
		expect(reading.kind).toBe('converted');
		if (reading.kind !== 'converted') return;
		// rate + adj per kWh (the README, after NREL's parsers): 0.07531 + 0.0119 and 0.09613 + 0.0119.
		expect(reading.tariff.energyCharges).toEqual([
			{
				label: 'Energy',
				type: 'tiered',
				tiers: [
					{ uptoKwh: 1000, perKwh: expect.closeTo(0.08721, 9) },
					{ uptoKwh: null, perKwh: expect.closeTo(0.10803, 9) }
				]
			}
		]);
		expect(tariffSchema.safeParse(reading.tariff).success).toBe(true);
		expect(reading.meta.label).toBe('5550d6fd5457a3187e8b4567');
		expect(reading.rate.uri).toBe('https://openei.org/apps/USURDB/rate/view/5550d6fd5457a3187e8b4567');
	});

	it('unwraps the database API answer of one rate (Georgia Power, time-of-use)', () => {
		const reading = readUrdbRate(georgia());
		expect(reading.kind).toBe('converted');
		if (reading.kind !== 'converted') return;
		expect(reading.tariff.energyCharges?.[0]?.type).toBe('tou');
		expect(reading.meta.utility).toBe('Georgia Power Co');
	});
});

describe('a body that is not one readable rate', () => {
	it.each([
		['an empty items list', { items: [] }, 'holds no rate'],
		['two rates', { items: [rs1(), rs1()] }, 'holds 2 rates; this import takes one at a time'],
		['items that is not a list', { items: 'x' }, '"items" must be a list'],
		['a bare list', [rs1()], 'not a list'],
		['a number', 42, 'Send one rate']
	])('refuses %s with a sentence', (_, body, words) => {
		const reading = readUrdbRate(body);
		expect(reading.kind).toBe('unreadable');
		if (reading.kind === 'unreadable') expect(reading.message).toContain(words);
	});

	it('says which month of which schedule has the wrong number of hours', () => {
		const rate = rs1();
		rate.energyweekdayschedule[3] = rate.energyweekdayschedule[3].slice(0, 23);
		const reading = readUrdbRate(rate);
		expect(reading.kind === 'unreadable' && reading.issues).toEqual([
			{
				path: 'energyweekdayschedule.3',
				message: 'Weekday energy schedule, April: Each month must have 24 hours'
			}
		]);
	});

	it('says where a period number points outside the rate structure, under items when wrapped', () => {
		const body = georgia();
		body.items[0].energyweekendschedule[6][14] = 5;
		const reading = readUrdbRate(body);
		expect(reading.kind === 'unreadable' && reading.issues).toEqual([
			{
				path: 'items.0.energyweekendschedule.6.14',
				message:
					'Weekend energy schedule, July, 14:00–15:00: Period 5 is not in the energy rate structure (it has 2)'
			}
		]);
	});

	it('refuses a negative rate and a NaN-like string, saying where', () => {
		const rate = rs1();
		rate.energyratestructure[0][1].rate = -0.1;
		rate.energyratestructure[0][0].adj = 'NaN';
		const reading = readUrdbRate(rate);
		expect(reading.kind === 'unreadable' && reading.issues.map((i) => i.message)).toEqual([
			'Energy rate structure, period 1, tier 1: Adjustment must be a number',
			'Energy rate structure, period 1, tier 2: Rate must be zero or more'
		]);
	});
});

describe('a rate Runrate cannot price exactly', () => {
	it('is refused with the notes, never converted', () => {
		const rate = rs1();
		rate.energyratestructure[0][0].unit = 'kWh/kW';
		const reading = readUrdbRate(rate);
		expect(reading.kind).toBe('refused');
		if (reading.kind === 'refused') {
			expect(reading.notes.map((n) => n.field)).toContain('energyratestructure');
			expect(REFUSED).toBe('This rate cannot be priced exactly by Runrate');
		}
	});
});

describe('places in words', () => {
	it.each([
		['energyratestructure.1.0.rate', 'Energy rate structure, period 2, tier 1'],
		['items.0.energyweekdayschedule.11.23', 'Weekday energy schedule, December, 23:00–24:00'],
		['label', 'Label'],
		['mystery', '"mystery"'],
		['', '']
	])('%s reads "%s"', (path, words) => expect(placeInWords(path)).toBe(words));

	it('turns zod’s generic type message into words', () => {
		expect(issueInWords({ path: 'label', message: 'Invalid input: expected string, received number' })).toBe(
			'Label has a value of the wrong kind'
		);
	});
});

describe('an object with none of a rate’s charges', () => {
	it('is not taken for a rate', () => {
		const reading = readUrdbRate({ label: 'x', utility: 'Nobody' });
		expect(reading.kind === 'unreadable' && reading.message).toContain('holds none of a rate’s charges');
	});
});

describe('a label PostgreSQL cannot hold', () => {
	it.each([
		['U+0000', 'a\u0000b'],
		['a lone surrogate', 'a\ud800b']
	])('is refused at the label (%s)', (_, label) => {
		const reading = readUrdbRate({ ...rs1(), label });
		expect(reading.kind === 'unreadable' && reading.issues.map((i) => i.path)).toEqual(['label']);
	});
});
