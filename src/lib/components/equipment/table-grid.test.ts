import { describe, expect, it } from 'vitest';
import { detailIssueCount } from './table-grid';

describe('problems hidden in a closed Details part', () => {
	it('counts the problems of fields that live in Details', () => {
		const issues = [
			{ path: 'schedule.windows.0.start' },
			{ path: 'schedule' },
			{ path: 'months.2' },
			{ path: 'lifeYears' },
			{ path: 'power.watts' },
			{ path: 'name' }
		];
		expect(detailIssueCount(issues)).toBe(4);
	});

	it('does not mistake a field whose name only starts like one in Details', () => {
		expect(detailIssueCount([{ path: 'scheduleX' }, { path: 'monthsAgo' }])).toBe(0);
	});
});
