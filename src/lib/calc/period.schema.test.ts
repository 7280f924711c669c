import { describe, expect, it } from 'vitest';
import { type Edit, issuesAfter, setField } from './requests.fixture';

const billing = (from: string, to: string) => setField('period', { billingPeriods: [{ from, to }] });

describe('bad periods, time zones and holidays', () => {
	it.each<[string, Edit, string, string]>([
		[
			'37 months',
			setField('period', { start: '2027-01', months: 37 }),
			'period.months',
			'Months must be at most 36'
		],
		[
			'a month that does not exist',
			setField('period', { start: '2027-13', months: 1 }),
			'period.start',
			'Start must be a month like 2027-01, between 1970 and 2100'
		],
		[
			'a period ending before it starts',
			billing('2027-02-10', '2027-01-12'),
			'period.billingPeriods.0.to',
			'To must be on or after From'
		],
		[
			'a period over 400 days',
			billing('2027-01-01', '2028-03-01'),
			'period.billingPeriods.0.to',
			'A billing period can be at most 400 days'
		],
		[
			'a date that does not exist',
			billing('2027-02-30', '2027-03-10'),
			'period.billingPeriods.0.from',
			'From must be a real date like 2027-01-31'
		],
		[
			'an unknown time zone',
			setField('timezone', 'Mars/Olympus_Mons'),
			'timezone',
			'Time zone must be an IANA name such as America/Chicago'
		],
		[
			'an unknown holiday country',
			setField('holidays', { country: 'XX' }),
			'holidays.country',
			'No holiday calendar for country XX'
		],
		[
			'an unknown holiday region',
			setField('holidays', { country: 'US', region: 'ZZ' }),
			'holidays.region',
			'No holiday calendar for region ZZ of US'
		],
		[
			'a holiday that is not a date',
			setField('holidays', { dates: ['July 5'] }),
			'holidays.dates.0',
			'Holiday must be a real date like 2027-01-31'
		]
	])('reports %s at its path', (_case, edit, path, message) => {
		expect(issuesAfter(edit)).toContainEqual({ path, message });
	});

	it('refuses more than 36 billing periods', () => {
		const periods = Array.from({ length: 37 }, () => ({ from: '2027-01-01', to: '2027-01-31' }));
		expect(issuesAfter(setField('period', { billingPeriods: periods }))).toEqual([
			{ path: 'period.billingPeriods', message: 'Billing periods can have at most 36 entries' }
		]);
	});

	it('accepts holiday codes in any case', () => {
		expect(issuesAfter(setField('holidays', { country: 'us', region: 'tx' }))).toEqual([]);
	});
});
