import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
	type PumpingDraft,
	blankDraft,
	fieldIssues,
	metersIn,
	missingPumpFields,
	numberDraft,
	pumpingRequest,
	readAnswer,
	usableWatts
} from './pumping-panel';

// Invented duty points for these tests only; no real pump or site.

const filled = (overrides: Partial<PumpingDraft> = {}): PumpingDraft => ({
	...blankDraft(),
	flow: '10',
	staticLift: '5',
	pipeLength: '50',
	innerDiameter: '1',
	efficiencyPercent: '25',
	...overrides
});

describe('a number box', () => {
	it.each([
		['2.5', 2.5],
		[' 40 ', 40],
		['.5', 0.5],
		['1e3', 1000],
		['-0', 0],
		['', undefined],
		['   ', undefined],
		['2,5', '2,5'],
		['ten', 'ten'],
		['1e999', '1e999']
	])('reads %j as %j', (text, value) => {
		expect(numberDraft(text)).toBe(value);
	});
});

describe('a blank form', () => {
	it('asks nothing and lists what the pump still needs', () => {
		expect(pumpingRequest(blankDraft())).toBeNull();
		expect(missingPumpFields(blankDraft())).toEqual([
			'flow',
			'staticLift',
			'pipeLength',
			'innerDiameter',
			'efficiencyPercent'
		]);
	});

	it('starts with C at 150 for smooth plastic pipe, fresh water and US units', () => {
		expect(blankDraft()).toMatchObject({
			hazenWilliamsC: '150',
			fluid: 'fresh',
			flowUnit: 'gpm',
			staticLiftUnit: 'ft'
		});
	});
});

describe('a filled-in pump', () => {
	it('posts every number with its unit', () => {
		expect(pumpingRequest(filled({ fluid: 'sea', flowUnit: 'lpm', innerDiameterUnit: 'mm' }))).toEqual({
			fluid: 'sea',
			pump: {
				flow: 10,
				flowUnit: 'lpm',
				staticLift: 5,
				staticLiftUnit: 'ft',
				pipeLength: 50,
				pipeLengthUnit: 'ft',
				innerDiameter: 1,
				innerDiameterUnit: 'mm',
				hazenWilliamsC: 150,
				efficiencyPercent: 25
			}
		});
	});

	it('leaves C out when its box is empty, so the API takes its default', () => {
		expect(pumpingRequest(filled({ hazenWilliamsC: '' }))?.pump).not.toHaveProperty('hazenWilliamsC');
	});

	it('sends text that is not a number as typed, for the API to name at its field', () => {
		expect(pumpingRequest(filled({ flow: '10 gpm' }))?.pump?.flow).toBe('10 gpm');
	});

	it('waits for the last empty box before asking about the pump', () => {
		const draft = filled({ efficiencyPercent: '' });
		expect(missingPumpFields(draft)).toEqual(['efficiencyPercent']);
		expect(pumpingRequest(draft)).toBeNull();
	});
});

describe('the air part', () => {
	it('posts the depth alone when the pump is not filled in', () => {
		expect(pumpingRequest({ ...blankDraft(), depth: '4.6', depthUnit: 'm' })).toEqual({
			fluid: 'fresh',
			air: { depth: 4.6, depthUnit: 'm' }
		});
	});

	it('posts both parts together when both are filled in', () => {
		const body = pumpingRequest(filled({ depth: '30', depthUnit: 'in' }));
		expect(Object.keys(body ?? {})).toEqual(['fluid', 'pump', 'air']);
	});
});

describe('any text in any box', () => {
	it('never puts NaN or Infinity in the body, and survives JSON unchanged', () => {
		const text = fc.oneof(
			fc.string(),
			fc.double().map(String),
			fc.constantFrom('NaN', 'Infinity', '-0', '1e400')
		);
		fc.assert(
			fc.property(text, text, text, (flow, efficiency, depth) => {
				const body = pumpingRequest(filled({ flow, efficiencyPercent: efficiency, depth }));
				const values = [...Object.values(body?.pump ?? {}), ...Object.values(body?.air ?? {})];
				expect(values.every((value) => typeof value === 'string' || Number.isFinite(value))).toBe(true);
				expect(JSON.parse(JSON.stringify(body))).toEqual(body);
			})
		);
	});
});

describe('issues from the API', () => {
	it('puts each message at its box, and a unit’s message with its quantity', () => {
		const { byField, other } = fieldIssues([
			{ path: 'pump.flow', message: 'Flow must be zero or more' },
			{ path: 'pump.innerDiameterUnit', message: 'Inner diameter unit must be one of: in, mm' },
			{ path: 'pump.innerDiameter', message: 'Inner diameter must be more than 0' },
			{ path: 'air.depth', message: 'Depth must be at most 1,000' },
			{ path: 'fluid', message: 'Fluid must be one of: fresh, sea' }
		]);
		expect(byField).toEqual({
			flow: ['Flow must be zero or more'],
			innerDiameter: ['Inner diameter unit must be one of: in, mm', 'Inner diameter must be more than 0'],
			depth: ['Depth must be at most 1,000'],
			fluid: ['Fluid must be one of: fresh, sea']
		});
		expect(other).toEqual([]);
	});

	it('keeps a message about the whole request apart', () => {
		expect(fieldIssues([{ path: '', message: 'Give a pump, an air depth, or both' }]).other).toEqual([
			'Give a pump, an air depth, or both'
		]);
	});
});

describe('reading the answer', () => {
	const answer = (status: number, body: unknown) =>
		readAnswer(
			new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })
		);

	it('reads a result', async () => {
		const result = {
			fluid: 'fresh',
			densityKgPerM3: 1000,
			pump: null,
			air: { depthM: 1, kPa: 9.8, psi: 1.4, inchesOfWater: 39 }
		};
		expect(await answer(200, result)).toEqual({ kind: 'result', result });
	});

	it('reads the fields to fix from a 400', async () => {
		const issues = [{ path: 'pump.flow', message: 'Flow is required' }];
		expect(await answer(400, { error: 'invalid_request', issues })).toEqual({ kind: 'issues', issues });
	});

	it('passes on the server’s sentence when it gives one, and the status when not', async () => {
		expect(await answer(429, { message: 'Too many requests. Wait a minute and try again.' })).toEqual({
			kind: 'failure',
			message: 'Too many requests. Wait a minute and try again.'
		});
		expect(await readAnswer(new Response('<html>', { status: 502 }))).toEqual({
			kind: 'failure',
			message: 'The helper could not answer (status 502).'
		});
	});
});

describe('the watts handed to the device', () => {
	it.each([
		[311.6, 312],
		[64.04, 64],
		[7.26, 7.3],
		[0, 0]
	])('offers %d W as %d W', (inputWatts, offered) => {
		expect(usableWatts(inputWatts)).toBe(offered);
	});
});

describe('lengths in the chosen unit', () => {
	it('gives metres in feet at 0.3048 m per foot (NIST SP 811, exact)', () => {
		expect(metersIn(3.048, 'ft')).toBeCloseTo(10, 12);
		expect(metersIn(3.048, 'm')).toBe(3.048);
	});
});
