import type ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { exportOf } from './workbook-exports';
import { gardenRequest } from './workbook-fixtures';
import { readBack, sheet, texts } from './workbook-read';

describe('the tariffs of a comparison whose scenarios use two', () => {
	const input = exportOf(gardenRequest(), 'Birchway school garden (invented)');
	let workbook: ExcelJS.Workbook;
	beforeAll(async () => {
		workbook = await readBack(input);
	});

	it('lists each distinct tariff once', () => {
		const words = texts(sheet(workbook, 'Tariff'));
		expect(words.filter((text) => text.startsWith('Demo Valley Power: standard rate'))).toHaveLength(1);
		expect(words.filter((text) => text.startsWith('Demo Valley Power: own rate'))).toHaveLength(1);
	});
});
