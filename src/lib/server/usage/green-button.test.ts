import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseGreenButton } from './green-button';
import { greenButtonXml, type FixtureOptions } from './green-button-fixture';
import type { Interval, UsageRead } from './interval';

const fixture = (name: string) => readFileSync(`tests/fixtures/green-button/${name}`, 'utf8');

function intervalsOf(read: UsageRead): Interval[] {
	if ('error' in read) throw new Error(`refused: ${read.error}`);
	return read.intervals;
}
/** The first reading's `tag` set to `to`. */
const editFirstReading = (xml: string, tag: string, to: string) =>
	xml.replace(new RegExp(`(<espi:IntervalReading>[\\s\\S]*?<espi:${tag}>)[^<]*`), `$1${to}`);
const errorOf = (read: UsageRead) => ('error' in read ? read.error : 'read without error');
const totalKwh = (intervals: Interval[]) => intervals.reduce((sum, i) => sum + i.kwh, 0);

/** Two hourly readings of 900 and 1200 Wh unless a case says otherwise. */
const small = (options: Partial<FixtureOptions> = {}) =>
	greenButtonXml({
		start: Date.UTC(2026, 0, 9, 6) / 1000,
		readings: 2,
		seconds: 3600,
		value: (i) => [900, 1200][i] ?? 0,
		...options
	});

describe('the invented sample files', () => {
	it('reads the hourly file, whose resources use ESPI as the default namespace', () => {
		const intervals = intervalsOf(parseGreenButton(fixture('hourly.xml')));
		expect(intervals).toHaveLength(48);
		expect(intervals[0]).toEqual({ start: new Date('2026-01-09T06:00:00Z'), seconds: 3600, kwh: 0.9 });
		expect(intervals.at(-1)!.start).toEqual(new Date('2026-01-11T05:00:00Z'));
		// 50,200 Wh in all, as the fixture's own comment states (invented data).
		expect(totalKwh(intervals)).toBeCloseTo(50.2, 9);
	});

	it('reads the 15-minute file with the espi: prefix and a multiplier of 10⁻³, leaving out energy sent to the grid', () => {
		const intervals = intervalsOf(parseGreenButton(fixture('quarter-hour.xml')));
		expect(intervals).toHaveLength(8);
		expect(intervals[0]).toEqual({ start: new Date('2026-06-15T05:00:00Z'), seconds: 900, kwh: 0.2125 });
		// 1,731,125 mWh = 1.731125 kWh, from the fixture's comment (invented data).
		expect(totalKwh(intervals)).toBeCloseTo(1.731125, 9);
	});

	it('refuses the file cut short in the middle of a reading', () => {
		expect(errorOf(parseGreenButton(fixture('malformed.xml')))).toMatch(/^The XML is malformed or cut short/);
	});

	it('refuses the XML bomb before parsing it', () => {
		expect(errorOf(parseGreenButton(fixture('bomb.xml')))).toMatch(/declares a DOCTYPE or entities/);
	});
});

describe('units and multipliers', () => {
	// kWh = value × 10^powerOfTenMultiplier Wh ÷ 1000: the ESPI definition of UnitMultiplierKind
	// and UnitSymbolKind 72 (Wh), NAESB REQ.21 espi.xsd.
	const table: [multiplier: number, value: number, kwh: number][] = [
		[0, 974, 0.974],
		[-3, 250_000, 0.25],
		[-1, 2_505, 0.2505],
		[1, 25, 0.25],
		[3, 2, 2],
		[6, 1, 1000]
	];
	it.each(table)('reads multiplier %i with value %d as %d kWh', (powerOfTenMultiplier, value, kwh) => {
		const [first] = intervalsOf(parseGreenButton(small({ powerOfTenMultiplier, value: () => value })));
		expect(first!.kwh).toBe(kwh);
	});

	it('refuses readings in a unit other than watt-hours, naming the unit', () => {
		expect(errorOf(parseGreenButton(small({ uom: 169 })))).toMatch(/ESPI unit 169, not watt-hours/);
	});

	it('refuses a multiplier that is not a whole number', () => {
		const xml = small().replace('<espi:powerOfTenMultiplier>0<', '<espi:powerOfTenMultiplier>1.5<');
		expect(errorOf(parseGreenButton(xml))).toMatch(/powerOfTenMultiplier \(1\.5\)/);
	});

	it('refuses running meter totals, which are not the use of each interval', () => {
		const xml = small().replace('<espi:accumulationBehaviour>4<', '<espi:accumulationBehaviour>1<');
		expect(errorOf(parseGreenButton(xml))).toMatch(/running meter totals/);
	});

	it('refuses a file that only holds energy sent back to the grid', () => {
		const xml = small().replace('<espi:flowDirection>1<', '<espi:flowDirection>19<');
		expect(errorOf(parseGreenButton(xml))).toMatch(/sent back to the grid/);
	});
});

describe('what the file may look like', () => {
	it('reads a file that starts with a byte-order mark and blank lines', () => {
		expect(intervalsOf(parseGreenButton(`\uFEFF\n\n${small()}`))).toHaveLength(2);
	});

	it('returns readings in time order whatever order the blocks come in', () => {
		const xml = editFirstReading(small(), 'start', '1767949200');
		const starts = intervalsOf(parseGreenButton(xml)).map((i) => i.start.toISOString());
		expect(starts).toEqual(['2026-01-09T07:00:00.000Z', '2026-01-09T09:00:00.000Z']);
	});
});

describe('files refused whole', () => {
	const cases: [situation: string, xml: string, message: RegExp][] = [
		['a file that is not XML', 'timestamp,kWh\n2026-01-09 00:00,0.9\n', /^This is not an XML file/],
		['an entity declaration without a DOCTYPE', `<!ENTITY x "y">${small()}`, /DOCTYPE or entities/],
		[
			'an XML file that is not an Atom feed',
			'<html><body>Usage</body></html>',
			/not a Green Button download/
		],
		['a feed without interval readings', small({ readings: 0 }), /holds no interval readings/],
		[
			'readings without a ReadingType',
			small().replace(/<entry>\s*<id>[^<]*a7<\/id>[\s\S]*?<\/entry>/, ''),
			/unit of its readings is unknown/
		],
		['a negative value', small({ value: () => -12 }), /is negative \(-12\)/],
		['a value that is not a number', editFirstReading(small(), 'value', '9OO'), /not a number \("9OO"\)/],
		['an empty value', editFirstReading(small(), 'value', ''), /not a number \(""\)/],
		[
			'a start that is not Unix seconds',
			editFirstReading(small(), 'start', '2026-01-09'),
			/no start time in Unix seconds/
		],
		[
			'a duration of zero',
			small().replace(/<espi:duration>3600</g, '<espi:duration>0<'),
			/lasts "0" seconds/
		],
		[
			'the same hour twice',
			small({ value: () => 900 }).replace('<espi:start>1767942000<', '<espi:start>1767938400<'),
			/cover the same time at 2026-01-09 06:00Z/
		]
	];
	it.each(cases)('refuses %s', (_situation, xml, message) => {
		const read = parseGreenButton(xml);
		expect('intervals' in read).toBe(false);
		expect(errorOf(read)).toMatch(message);
	});

	it('refuses more than a million readings without parsing them', () => {
		const xml = `<feed>${'<IntervalReading></IntervalReading>'.repeat(1_000_001)}</feed>`;
		expect(errorOf(parseGreenButton(xml))).toBe(
			'The file holds 1,000,001 readings; one import can hold at most 1,000,000.'
		);
	});
});
