import { describe, expect, it } from 'vitest';
import { parseRequest } from './parse';
import { periodOverlapIssues, seasonCoverageIssues, tierIssues } from './tariff';
import { tariffSchema } from './tariff.schema';
import { tiered } from './tariffs.fixture';

const window = (start: string, end: string) => ({ start, end });

function issuesOf(tariff: unknown) {
	const result = parseRequest(tariffSchema, { currency: 'USD', ...(tariff as object) });
	return result.success ? [] : result.error.issues;
}

describe('tiers', () => {
	it('accepts increasing tiers ending open', () => {
		expect(tierIssues([{ uptoKwh: 100 }, { uptoKwh: 200 }, { uptoKwh: null }])).toEqual([]);
	});

	it('reports tiers that do not increase, and a last tier with an end', () => {
		const issues = issuesOf({
			energyCharges: [tiered('Delivery', [500, 0.05], [400, 0.06], [900, 0.07])]
		});
		expect(issues.map((issue) => issue.path)).toEqual([
			'energyCharges.0.tiers.1.uptoKwh',
			'energyCharges.0.tiers.2.uptoKwh'
		]);
		expect(issues[1]?.message).toBe('The last tier must be open-ended (uptoKwh null)');
	});

	it('reports an open tier before the last', () => {
		expect(tierIssues([{ uptoKwh: null }, { uptoKwh: null }])).toEqual([
			{ path: [0, 'uptoKwh'], message: 'Only the last tier can be open-ended (uptoKwh null)' }
		]);
	});
});

describe('seasons', () => {
	it('reports months in no season', () => {
		const issues = issuesOf({
			energyCharges: [
				{
					label: 'Supply',
					type: 'tou',
					seasons: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11], periods: [], otherPerKwh: 0.1 }]
				}
			]
		});
		expect(issues).toEqual([
			{ path: 'energyCharges.0.seasons', message: 'Every month needs a season; missing: 12 (December)' }
		]);
	});

	it('asks a charge limited to some months for seasons over those months only', () => {
		const summer = [6, 7, 8, 9];
		const charge = (seasonMonths: number[]) => ({
			label: 'Summer peak adder',
			type: 'tou',
			months: summer,
			seasons: [{ months: seasonMonths, periods: [], otherPerKwh: 0 }]
		});
		expect(issuesOf({ energyCharges: [charge(summer)] })).toEqual([]);
		expect(issuesOf({ energyCharges: [charge([6, 7, 8])] })).toEqual([
			{
				path: 'energyCharges.0.seasons',
				message: 'Every month this charge applies needs a season; missing: 9 (September)'
			}
		]);
		expect(issuesOf({ energyCharges: [charge([5, 6, 7, 8, 9])] })).toEqual([
			{
				path: 'energyCharges.0.seasons.0.months.0',
				message: 'Month 5 (May) is not one of the months this charge applies'
			}
		]);
	});

	it('reports a month in two seasons at the second', () => {
		expect(
			seasonCoverageIssues([{ months: [1, 2, 3, 4, 5, 6] }, { months: [6, 7, 8, 9, 10, 11, 12] }])
		).toEqual([{ path: [1, 'months', 0], message: 'Month 6 (June) is already in an earlier season' }]);
	});
});

describe('time-of-use periods', () => {
	it('reports periods of a season that overlap on the same days', () => {
		const issues = periodOverlapIssues([
			{ label: 'On-peak', days: 'weekdays', windows: [window('16:00', '21:00')] },
			{ label: 'Mid-peak', days: 'all', windows: [window('12:00', '16:15')] }
		]);
		expect(issues).toEqual([
			{ path: [1, 'windows'], message: '“Mid-peak” overlaps “On-peak” on weekdays at 16:00' }
		]);
	});

	it('lets periods share windows on different days', () => {
		const issues = periodOverlapIssues([
			{ label: 'Weekday peak', days: 'weekdays', windows: [window('16:00', '21:00')] },
			{ label: 'Weekend peak', days: 'weekends', windows: [window('16:00', '21:00')] }
		]);
		expect(issues).toEqual([]);
	});

	it('sees an overlap past midnight', () => {
		const issues = periodOverlapIssues([
			{ label: 'Night', days: 'all', windows: [window('22:00', '06:00')] },
			{ label: 'Early', days: 'all', windows: [window('05:00', '07:00')] }
		]);
		expect(issues).toHaveLength(1);
	});
});

describe('tariff fields', () => {
	it('reports a currency that is not a code', () => {
		expect(issuesOf({ currency: 'dollars' })).toEqual([
			{ path: 'currency', message: 'Currency must be a three-letter code such as USD' }
		]);
	});

	it('reports a fixed charge given both per month and per day', () => {
		expect(issuesOf({ fixedCharges: [{ label: 'Basic', perMonth: 1, perDay: 1 }] })).toEqual([
			{ path: 'fixedCharges.0', message: 'Give a fixed charge per month, per day or per year (one of them)' }
		]);
	});

	it('reports a negative rate', () => {
		expect(issuesOf({ energyCharges: [{ label: 'Energy', type: 'flat', perKwh: -0.1 }] })).toEqual([
			{ path: 'energyCharges.0.perKwh', message: 'Per kWh must be zero or more' }
		]);
	});
});

describe('demand charges', () => {
	it('requires hourly windows for 60-minute demand', () => {
		const issues = issuesOf({
			demandCharges: [{ label: 'Demand', perKw: 5, intervalMinutes: 60, windows: [window('16:30', '21:00')] }]
		});
		expect(issues).toEqual([
			{
				path: 'demandCharges.0.windows.0.start',
				message: 'Windows of 60-minute demand must start and end on the hour'
			}
		]);
	});

	it('refuses interval lengths other than 15 and 60 minutes', () => {
		const issues = issuesOf({ demandCharges: [{ label: 'Demand', perKw: 5, intervalMinutes: 30 }] });
		expect(issues).toEqual([
			{ path: 'demandCharges.0.intervalMinutes', message: 'Interval minutes must be 15 or 60' }
		]);
	});
});
