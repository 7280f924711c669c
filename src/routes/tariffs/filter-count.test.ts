import { describe, expect, it } from 'vitest';
import { activeFilterCount } from './filter-count';

const none = { q: '', country: '', region: '', customerClass: '', feature: '', scope: '', sort: '' };

describe('activeFilterCount', () => {
	it('counts no filter when nothing narrows the list, whatever the sort', () => {
		expect(activeFilterCount({ ...none, sort: 'cost' })).toBe(0);
		expect(activeFilterCount({ ...none, q: '   ' })).toBe(0);
	});

	it('counts each filter in use once', () => {
		expect(activeFilterCount({ ...none, q: 'farm', country: 'US', feature: 'tou' })).toBe(3);
	});
});
