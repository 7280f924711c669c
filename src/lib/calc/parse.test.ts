import { describe, expect, it } from 'vitest';
import { VALID_INPUT, issuesAfter, setDevice, setField } from './requests.fixture';
import { parseRequest } from './parse';
import { calculateRequestSchema } from './request.schema';

describe('a valid request', () => {
	it('parses with its defaults filled in', () => {
		const result = parseRequest(calculateRequestSchema, VALID_INPUT);
		expect(result.success).toBe(true);
		if (!result.success) return;
		const [pump] = result.data.equipment;
		expect(pump).toMatchObject({ quantity: 1, dutyPercent: 100, standbyWatts: 0, category: 'other' });
		expect(pump?.power).toEqual({ amps: 1, volts: 120, powerFactor: 1, phases: 1 });
		expect(result.data.tariff.holidaysAsWeekends).toBe(true);
	});
});

describe('a body that is not a request', () => {
	it('refuses a body that is not an object', () => {
		expect(parseRequest(calculateRequestSchema, [1, 2])).toEqual({
			success: false,
			error: {
				error: 'invalid_request',
				issues: [{ path: '', message: 'The request must be a JSON object' }]
			}
		});
	});

	it('reports each missing field at its path', () => {
		expect(issuesAfter(setField('timezone', undefined))).toEqual([
			{ path: 'timezone', message: 'Time zone must be an IANA name such as America/Chicago' }
		]);
		expect(issuesAfter(setDevice({ name: undefined }))).toEqual([
			{ path: 'equipment.0.name', message: 'Name is required' }
		]);
	});
});

describe('a value that fits no form of a union', () => {
	it('reports the form the input evidently meant', () => {
		expect(issuesAfter(setDevice({ power: { amps: -1, volts: 120 } }))).toEqual([
			{ path: 'equipment.0.power.amps', message: 'Amps must be zero or more' }
		]);
	});

	it('reports the union’s own message when the input is empty or ambiguous', () => {
		const message = 'Give power as watts, or as amps and volts (not both)';
		expect(issuesAfter(setDevice({ power: {} }))).toEqual([{ path: 'equipment.0.power', message }]);
		expect(issuesAfter(setDevice({ power: { amps: 1 } }))).toEqual([{ path: 'equipment.0.power', message }]);
		expect(issuesAfter(setDevice({ power: { watts: 5, amps: 1, volts: 120 } }))).toEqual([
			{ path: 'equipment.0.power', message }
		]);
	});
});
