import { describe, expect, it } from 'vitest';
import { actionErrors, actionValues } from './action-result';

describe("what a page reads from its action's result", () => {
	it('gives the messages and the values sent back', () => {
		const form = { errors: { email: 'Enter an e-mail address' }, values: { email: 'grower@' } };
		expect(actionErrors(form)).toEqual({ email: 'Enter an e-mail address' });
		expect(actionValues(form)).toEqual({ email: 'grower@' });
	});

	it('gives nothing before a post, or for a result without them', () => {
		expect(actionErrors(null)).toEqual({});
		expect(actionValues(undefined)).toEqual({});
		expect(actionErrors({ sent: 'grower@example.test' })).toEqual({});
		expect(actionValues({ values: undefined })).toEqual({});
	});
});
