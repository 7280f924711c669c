import { describe, expect, it } from 'vitest';
import { describedBy, mergeIssues, messagesAt, messagesUnder } from './field-issues';

describe('issues in a tariff', () => {
	const issues = [
		{
			path: 'energyCharges.0.seasons.1.months.2',
			message: 'Month 3 (March) is already in an earlier season'
		},
		{ path: 'energyCharges.0.seasons.1.months', message: 'Months must not be empty' },
		{ path: 'energyCharges.0.seasons.10.months', message: 'Another season' }
	];

	it('finds the messages of one field, or of a group and what is inside it', () => {
		expect(messagesAt(issues, 'energyCharges.0.seasons.1.months')).toEqual(['Months must not be empty']);
		expect(messagesUnder(issues, 'energyCharges.0.seasons.1.months')).toHaveLength(2);
		expect(messagesUnder(issues, 'energyCharges.0.seasons.1')).toHaveLength(2);
	});

	it('lists a message the client and the server both give once', () => {
		const server = [{ path: 'currency', message: 'Currency must be a three-letter code such as USD' }];
		expect(mergeIssues(server, server, issues)).toHaveLength(4);
	});
});

describe('issues in the equipment table', () => {
	it('shows a message said twice (by the browser and the server) once', () => {
		const issue = { path: 'name', message: 'Name must not be empty' };
		expect(mergeIssues([issue], [issue, { path: 'quantity', message: 'x' }])).toHaveLength(2);
	});

	it('finds messages at a path, or under it', () => {
		const issues = [
			{ path: 'months', message: 'a' },
			{ path: 'months.2', message: 'b' },
			{ path: 'monthsX', message: 'c' }
		];
		expect(messagesAt(issues, 'months')).toEqual(['a']);
		expect(messagesUnder(issues, 'months')).toEqual(['a', 'b']);
	});
});

describe('what a box is described by', () => {
	it('names the hint and the messages it has, in the order given', () => {
		expect(describedBy('f-email', 'hint', 'error')).toBe('f-email-hint f-email-error');
		expect(describedBy('f-email', 'error', undefined)).toBe('f-email-error');
		expect(describedBy('f-email', false, undefined)).toBeUndefined();
	});
});
