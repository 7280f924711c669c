import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseRequest } from '$lib/calc';
import { tariffSubmissionSchema } from './submission';
import { customerClassOf, dateOf, sourceOf, urdbSubmission } from './urdb-provenance';
import { readUrdbRate } from './urdb-read';

// The samples are public records of the OpenEI Utility Rate Database (tests/fixtures/urdb/README.md).
const rs1 = () => JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8'));

describe('dates', () => {
	it.each([
		// RS-1 2015: from 1 June 2015 (00:00 UTC) to 31 August 2015 (stored as 23:00 UTC the day before).
		[1433116800, '2015-06-01'],
		[1440975600, '2015-08-31'],
		// Georgia Power TOU-REO: 2013-01-01 and 2016-12-31, stored at 01:00 UTC.
		[1357002000, '2013-01-01'],
		[1483146000, '2016-12-31']
	])('%i is %s', (seconds, date) => expect(dateOf(seconds)).toBe(date));

	it('gives none for a missing or absurd timestamp', () => {
		expect(dateOf(undefined)).toBeNull();
		expect(dateOf(1e15)).toBeNull();
	});
});

describe('customer class and source', () => {
	it.each([
		['Residential', 'residential'],
		['Commercial', 'commercial'],
		['Industrial', 'industrial'],
		['Lighting', 'other'],
		[null, 'other']
	])('sector %s is %s', (sector, cls) => expect(customerClassOf(sector)).toBe(cls));

	it('names the rate’s page, or the database and label when it has no address', () => {
		expect(sourceOf({ uri: 'https://openei.org/apps/USURDB/rate/view/x', label: 'x' })).toBe(
			'https://openei.org/apps/USURDB/rate/view/x'
		);
		expect(sourceOf({ label: 'abc' })).toBe('OpenEI Utility Rate Database, label abc');
	});
});

describe('the submission', () => {
	it('passes the library’s own checks with the provenance filled in', () => {
		const reading = readUrdbRate(rs1());
		if (reading.kind !== 'converted') throw new Error('RS-1 converts');
		const built = urdbSubmission(reading, { timezone: 'America/New_York' }, '2026-12-03');
		const parsed = parseRequest(tariffSubmissionSchema, built);
		expect(parsed.success).toBe(true);
		expect(built.meta).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service',
			customerClass: 'residential',
			country: 'US',
			currency: 'USD',
			timezone: 'America/New_York',
			holidays: null
		});
		expect(built.version).toMatchObject({
			effectiveFrom: '2015-06-01',
			effectiveTo: '2015-08-31',
			source: 'https://openei.org/apps/USURDB/rate/view/5550d6fd5457a3187e8b4567',
			checkedOn: '2026-12-03'
		});
	});

	it('takes the person’s start date only when the rate has none', () => {
		const rate = rs1();
		delete rate.startdate;
		delete rate.enddate;
		const reading = readUrdbRate(rate);
		if (reading.kind !== 'converted') throw new Error('RS-1 converts');
		const built = urdbSubmission(
			reading,
			{ timezone: 'America/New_York', effectiveFrom: '2015-06-01' },
			'2026-12-03'
		);
		expect(built.version.effectiveFrom).toBe('2015-06-01');
		expect(built.version.effectiveTo).toBeNull();
	});

	it('leaves out the rate’s end date only when the person asks, and says so in the change note', () => {
		const reading = readUrdbRate(rs1());
		if (reading.kind !== 'converted') throw new Error('RS-1 converts');
		const kept = urdbSubmission(reading, { timezone: 'America/New_York' }, '2026-12-03');
		expect(kept.version.effectiveTo).toBe('2015-08-31');
		expect(kept.version.changeNote).not.toContain('left out');
		const open = urdbSubmission(reading, { timezone: 'America/New_York', openEnded: true }, '2026-12-03');
		expect(open.version.effectiveTo).toBeNull();
		expect(open.version.effectiveFrom).toBe('2015-06-01');
		expect(open.version.changeNote).toContain("The database's end date, 2015-08-31, was left out at import.");
		expect(parseRequest(tariffSubmissionSchema, open).success).toBe(true);
	});

	it('cuts a name longer than the library holds, marking the cut', () => {
		const rate = { ...rs1(), name: 'N'.repeat(300) };
		const reading = readUrdbRate(rate);
		if (reading.kind !== 'converted') throw new Error('RS-1 converts');
		const built = urdbSubmission(reading, { timezone: 'America/New_York' }, '2026-12-03');
		expect(built.meta.name).toHaveLength(120);
		expect(built.meta.name.endsWith('…')).toBe(true);
	});
});
