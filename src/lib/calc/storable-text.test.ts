import { describe, expect, it } from 'vitest';
import { issuesAfter, request, setDevice } from './requests.fixture';
import { parseRequest } from './parse';
import { calculateRequestSchema } from './request.schema';
import { SURROGATE_MESSAGE } from './storable-text';

// PostgreSQL's jsonb refuses a lone surrogate (a 500 before issue 14, item 11); the core's text fields
// refuse it at the field, as they do U+0000.
describe('a lone surrogate in a stored name or label', () => {
	it('is refused at the device name, in words', () => {
		expect(issuesAfter(setDevice({ name: 'Pump \uD800' }))).toEqual([
			{ path: 'equipment.0.name', message: SURROGATE_MESSAGE }
		]);
	});

	it('is refused at a charge label', () => {
		const body = JSON.parse(JSON.stringify(request()));
		body.tariff.energyCharges[0].label = 'Energy \uDC00';
		const parsed = parseRequest(calculateRequestSchema, body);
		expect(parsed.success ? [] : parsed.error.issues).toEqual([
			{ path: 'tariff.energyCharges.0.label', message: SURROGATE_MESSAGE }
		]);
	});

	it('leaves whole emoji alone', () => {
		expect(issuesAfter(setDevice({ name: 'Pump 💧' }))).toEqual([]);
	});
});
