import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { newFittingRow } from './friction-draft';
import { fieldIssues } from './pumping-issues';
import {
	type PumpingDraft,
	blankDraft,
	efficiencyProblem,
	missingPumpFields,
	numberDraft,
	pumpingRequest
} from './pumping-panel';
import {
	metersIn,
	plausibilityNote,
	readAnswer,
	speedText,
	usableWatts,
	useButtonText
} from './pumping-result';

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
				efficiencyPercent: 25,
				frictionMethod: 'hazen-williams'
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

	it('puts a fitting’s message at its row, and the list’s at the list', () => {
		const { byField, byFittingRow, other } = fieldIssues([
			{ path: 'pump.fittings.1.count', message: 'Number of fittings must be a whole number' },
			{ path: 'pump.fittings', message: 'Fittings can have at most 50 entries' },
			{ path: 'pump.roughnessMm', message: 'Pipe roughness must be zero or more' },
			{ path: 'pump.waterTemperatureC', message: 'Water temperature must be at most 40' }
		]);
		expect(byFittingRow).toEqual({ 1: ['Number of fittings must be a whole number'] });
		expect(byField).toEqual({
			fittings: ['Fittings can have at most 50 entries'],
			roughnessMm: ['Pipe roughness must be zero or more'],
			waterTemperatureC: ['Water temperature must be at most 40']
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

describe('an efficiency typed as a fraction', () => {
	it('refuses 0.3 (0.3 %) at its box, offers 30 % and asks nothing about the pump', () => {
		const draft = filled({ efficiencyPercent: '0.3' });
		expect(efficiencyProblem(draft)).toEqual({
			message:
				'Wire-to-water efficiency is in percent: 0.3 would be 0.3 %, far below any pump. Did you mean 30 %?',
			meantPercent: '30'
		});
		expect(pumpingRequest(draft)).toBeNull();
	});

	it('still asks about the air part while the pump waits for its efficiency', () => {
		expect(pumpingRequest(filled({ efficiencyPercent: '0.45', depth: '3' }))).toEqual({
			fluid: 'fresh',
			air: { depth: 3, depthUnit: 'ft' }
		});
		expect(efficiencyProblem(filled({ efficiencyPercent: '0.455' }))?.meantPercent).toBe('45.5');
	});

	it.each(['1', '25', '100', '0', '', 'abc'])(
		'leaves %j to the API (1 % and up, or its own messages)',
		(text) => {
			expect(efficiencyProblem(filled({ efficiencyPercent: text }))).toBeNull();
		}
	);
});

describe('a result far beyond the list', () => {
	// 0.3 taken as 0.3 % gave 5,078 W against a list whose largest device is 1,500 W (issue 17).
	it('questions watts more than three times the largest device', () => {
		expect(plausibilityNote(5078, [1500, 60, undefined])).toBe(
			'That is about 3 times the largest device in this list (1,500 W). Check the flow and its unit, the head and the efficiency before using it.'
		);
	});

	it('says nothing for watts in the range of the list, or for a list without watts', () => {
		expect(plausibilityNote(4500, [1500])).toBeNull();
		expect(plausibilityNote(51, [90, 60])).toBeNull();
		expect(plausibilityNote(5078, [])).toBeNull();
		expect(plausibilityNote(5078, [undefined, 0])).toBeNull();
	});
});

describe('the water speed', () => {
	// 1 ft = 0.3048 m exactly (NIST SP 811): 0.3048 m/s is 1 ft/s.
	it('is in ft/s after US inputs', () => {
		expect(speedText(0.3048, filled())).toBe('1 ft/s');
	});

	it('is in m/s after metric inputs', () => {
		const metric = filled({
			flowUnit: 'lpm',
			staticLiftUnit: 'm',
			pipeLengthUnit: 'm',
			innerDiameterUnit: 'mm'
		});
		expect(speedText(1.234, metric)).toBe('1.23 m/s');
	});

	it('gives both when the inputs mix the two', () => {
		expect(speedText(0.6096, filled({ innerDiameterUnit: 'mm' }))).toBe('0.61 m/s (2 ft/s)');
	});
});

describe('putting the watts into a device', () => {
	it('offers no button until a device is chosen, so no row gets them by default', () => {
		expect(useButtonText(51, null)).toBeNull();
	});

	it('names the chosen device on the button', () => {
		expect(useButtonText(50.8, { name: 'Small pump' })).toBe('Use 50.8 W for Small pump');
		expect(useButtonText(312, { name: 'device 2' })).toBe('Use 312 W for device 2');
	});
});

describe('the friction method and the fittings', () => {
	it('starts on Hazen–Williams with no fittings, so the request reads as before this choice existed', () => {
		expect(blankDraft()).toMatchObject({ frictionMethod: 'hazen-williams', fittings: [] });
		expect(pumpingRequest(filled())?.pump).not.toHaveProperty('fittings');
	});

	it('sends roughness and water temperature, not C, for Darcy–Weisbach', () => {
		const pump = pumpingRequest(
			filled({
				frictionMethod: 'darcy-weisbach',
				roughnessMm: '0.15',
				waterTemperatureC: '12',
				hazenWilliamsC: 'x'
			})
		)?.pump;
		expect(pump).toMatchObject({
			frictionMethod: 'darcy-weisbach',
			roughnessMm: 0.15,
			waterTemperatureC: 12
		});
		expect(pump).not.toHaveProperty('hazenWilliamsC');
	});

	it('sends C, not roughness or temperature, for Hazen–Williams', () => {
		const pump = pumpingRequest(filled({ roughnessMm: 'rough', waterTemperatureC: '' }))?.pump;
		expect(pump).toMatchObject({ hazenWilliamsC: 150 });
		expect(pump).not.toHaveProperty('roughnessMm');
		expect(pump).not.toHaveProperty('waterTemperatureC');
	});

	it('sends each fitting row as its kind and count, and a row with an empty count without one', () => {
		const first = newFittingRow([]);
		const second = { ...newFittingRow([first]), kind: 'ball-valve' as const, count: '' };
		const third = { ...newFittingRow([first, second]), count: '2.5' };
		expect([first.id, second.id, third.id]).toEqual([1, 2, 3]);
		expect(
			pumpingRequest(filled({ fittings: [{ ...first, count: '2' }, second, third] }))?.pump?.fittings
		).toEqual([
			{ kind: 'elbow-90-short', count: 2 },
			{ kind: 'ball-valve' },
			{ kind: 'elbow-90-short', count: 2.5 }
		]);
	});

	it('gives a new row an id no row of the list has, after a removal too', () => {
		expect(newFittingRow([{ id: 4, kind: 'exit', count: '1' }]).id).toBe(5);
	});
});
