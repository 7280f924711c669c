import { describe, expect, it } from 'vitest';
import { exportOf } from './workbook-exports';
import { gardenRequest } from './workbook-fixtures';
import { readBackOnce, sheet, texts } from './workbook-read';

describe('the tariffs of a comparison whose scenarios use two', () => {
	const input = exportOf(gardenRequest(), 'Birchway school garden (invented)');
	const workbook = readBackOnce(input);

	it('lists each distinct tariff once', () => {
		const words = texts(sheet(workbook(), 'Tariff'));
		expect(words.filter((text) => text.startsWith('Demo Valley Power: standard rate'))).toHaveLength(1);
		expect(words.filter((text) => text.startsWith('Demo Valley Power: own rate'))).toHaveLength(1);
	});
});
