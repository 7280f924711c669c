import { describe, expect, it } from 'vitest';
import { EMPTY_SITE_WATER, type Tank } from '$lib/calc';
import { waterDraftFrom, waterDraftOf } from './tank-form';
import { readWaterDraft } from './tank-read';

/** A form post as entries, the way FormData yields them. */
const post = (fields: Record<string, string>) => Object.entries(fields);

const growOut = {
	'tanks.0.id': 'growout1',
	'tanks.0.name': 'Grow-out 1 (invented)',
	'tanks.0.volume': '1000',
	'tanks.0.volumeUnit': 'L',
	'tanks.0.depth': '1.2',
	'tanks.0.depthUnit': 'm',
	'tanks.0.water': 'fresh',
	'tanks.0.temperatureC': '24',
	'tanks.0.fishKg': '40',
	'tanks.0.feedKgPerDay': '0.8',
	'tanks.0.proteinPercent': '40'
};

describe('reading the water of a site form', () => {
	it('stores litres, metres and °C, with the tank id the browser made', () => {
		const read = readWaterDraft(waterDraftFrom(post({ altitudeM: '250', ...growOut })));
		expect(read).toEqual({
			ok: true,
			water: {
				altitudeM: 250,
				tanks: [
					{
						id: 'growout1',
						name: 'Grow-out 1 (invented)',
						volumeLiters: 1000,
						depthM: 1.2,
						water: 'fresh',
						temperatureC: 24,
						monthlyTemperatureC: null,
						fishKg: 40,
						feedKgPerDay: 0.8,
						proteinPercent: 40
					}
				]
			}
		});
	});

	it('converts US gallons and feet (NIST SP 811: 3.785 411 784 L a gallon, 0.3048 m a foot)', () => {
		const read = readWaterDraft(
			waterDraftFrom(
				post({
					...growOut,
					'tanks.0.volume': '100',
					'tanks.0.volumeUnit': 'gal',
					'tanks.0.depth': '4',
					'tanks.0.depthUnit': 'ft'
				})
			)
		);
		if (!read.ok) throw new Error(JSON.stringify(read.errors));
		expect(read.water.tanks[0]!.volumeLiters).toBeCloseTo(378.5411784, 9);
		expect(read.water.tanks[0]!.depthM).toBeCloseTo(1.2192, 12);
	});

	it('keeps twelve monthly temperatures, with the warmest as the one the designer uses (warm water holds the least oxygen)', () => {
		const months = [10, 10, 12, 14, 18, 22, 26, 26, 22, 18, 14, 12];
		const fields: Record<string, string> = {
			...growOut,
			'tanks.0.byMonth': 'on',
			'tanks.0.temperatureC': ''
		};
		months.forEach((t, m) => (fields[`tanks.0.monthlyTemperatureC.${m}`] = String(t)));
		const read = readWaterDraft(waterDraftFrom(post(fields)));
		if (!read.ok) throw new Error(JSON.stringify(read.errors));
		expect(read.water.tanks[0]!.monthlyTemperatureC).toEqual(months);
		expect(read.water.tanks[0]!.temperatureC).toBe(26);
	});

	it('fills what the schema defaults: no altitude is sea level, no fish or feed is zero, protein 35 %', () => {
		const read = readWaterDraft(
			waterDraftFrom(
				post({ ...growOut, 'tanks.0.fishKg': '', 'tanks.0.feedKgPerDay': '', 'tanks.0.proteinPercent': '' })
			)
		);
		if (!read.ok) throw new Error(JSON.stringify(read.errors));
		expect(read.water.altitudeM).toBe(0);
		expect(read.water.tanks[0]).toMatchObject({ fishKg: 0, feedKgPerDay: 0, proteinPercent: 35 });
	});

	it('drops a row left blank and closes the gap a removed row left', () => {
		const read = readWaterDraft(
			waterDraftFrom(
				post({
					'tanks.0.id': 'blankrow',
					'tanks.0.name': ' ',
					'tanks.0.water': 'fresh',
					'tanks.0.proteinPercent': '35',
					...Object.fromEntries(Object.entries(growOut).map(([k, v]) => [k.replace('.0.', '.3.'), v]))
				})
			)
		);
		if (!read.ok) throw new Error(JSON.stringify(read.errors));
		expect(read.water.tanks.map((t) => t.id)).toEqual(['growout1']);
	});

	it('makes a new id for a row whose id is missing, malformed or repeated', () => {
		const second = Object.fromEntries(Object.entries(growOut).map(([k, v]) => [k.replace('.0.', '.1.'), v]));
		const read = readWaterDraft(waterDraftFrom(post({ ...growOut, ...second })));
		if (!read.ok) throw new Error(JSON.stringify(read.errors));
		const [a, b] = read.water.tanks;
		expect(a!.id).toBe('growout1');
		expect(b!.id).toMatch(/^[0-9a-f]{32}$/);
	});
});

describe('a refused water form', () => {
	it('names each problem once, at the box it belongs to, in words', () => {
		const read = readWaterDraft(
			waterDraftFrom(
				post({
					altitudeM: 'high',
					...growOut,
					'tanks.0.volume': '0',
					'tanks.0.depth': 'deep',
					'tanks.0.water': 'brackish'
				})
			)
		);
		expect(read).toEqual({
			ok: false,
			errors: {
				altitudeM: 'Altitude must be a number',
				'tanks.0.volume': 'Volume must be more than 0',
				'tanks.0.depth': 'Depth must be a number',
				'tanks.0.water': 'Water must be one of: fresh, sea'
			}
		});
	});

	it('names a bad month by its name, at its own box', () => {
		const fields: Record<string, string> = { ...growOut, 'tanks.0.byMonth': 'on' };
		for (let m = 0; m < 12; m++) fields[`tanks.0.monthlyTemperatureC.${m}`] = '20';
		fields['tanks.0.monthlyTemperatureC.2'] = '55';
		fields['tanks.0.monthlyTemperatureC.7'] = '';
		const read = readWaterDraft(waterDraftFrom(post(fields)));
		expect(read).toEqual({
			ok: false,
			errors: {
				'tanks.0.monthlyTemperatureC.2': 'March water temperature must be at most 40',
				'tanks.0.monthlyTemperatureC.7': 'August water temperature is required'
			}
		});
	});

	it('refuses a unit the form does not offer, at the unit box', () => {
		const read = readWaterDraft(waterDraftFrom(post({ ...growOut, 'tanks.0.volumeUnit': 'barrel' })));
		expect(read).toEqual({
			ok: false,
			errors: { 'tanks.0.volumeUnit': 'Pick the volume’s unit: litres, US gallons or m³' }
		});
	});
});

describe('a stored site’s water in the form', () => {
	it('reads back as it was stored, so saving the form unchanged changes nothing', () => {
		const tank: Tank = {
			id: 'sump',
			name: 'Sump (invented)',
			volumeLiters: 378.5411784,
			depthM: 1.2192,
			water: 'sea',
			salinityGPerKg: 32,
			temperatureC: 26,
			monthlyTemperatureC: [10, 10, 12, 14, 18, 22, 26, 26, 22, 18, 14, 12],
			fishKg: 0,
			feedKgPerDay: 0,
			proteinPercent: 35
		};
		const water = { altitudeM: 1234.5, tanks: [tank] };
		const draft = waterDraftOf(water);
		const fields: [string, string][] = [['altitudeM', draft.altitudeM]];
		for (const [k, v] of Object.entries(draft.tanks[0]!)) {
			if (k === 'monthlyTemperatureC')
				(v as string[]).forEach((t, m) => fields.push([`tanks.0.${k}.${m}`, t]));
			else if (k === 'byMonth') fields.push([`tanks.0.${k}`, v ? 'on' : '']);
			else fields.push([`tanks.0.${k}`, String(v)]);
		}
		expect(readWaterDraft(waterDraftFrom(fields))).toEqual({ ok: true, water });
		expect(readWaterDraft(waterDraftFrom([]))).toEqual({ ok: true, water: EMPTY_SITE_WATER });
	});
});

describe('a refusal after a blank row', () => {
	it('names the row as it was posted, so the message lands on the row the person sees', () => {
		const fields = {
			'tanks.0.id': 'blankrow',
			'tanks.0.water': 'fresh',
			'tanks.0.proteinPercent': '35',
			...Object.fromEntries(Object.entries(growOut).map(([k, v]) => [k.replace('.0.', '.1.'), v])),
			'tanks.1.volume': '-5'
		};
		expect(readWaterDraft(waterDraftFrom(post(fields)))).toEqual({
			ok: false,
			errors: { 'tanks.1.volume': 'Volume must be more than 0' }
		});
	});
});
