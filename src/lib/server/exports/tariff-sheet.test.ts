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

	it("gives each tariff's provenance beside its charges: utility, dates in force, source, check, label", () => {
		const tariffSheet = sheet(workbook(), 'Tariff');
		const rows: string[][] = [];
		tariffSheet.eachRow((row) => rows.push([String(row.getCell(1).value), String(row.getCell(2).value)]));
		const valuesOf = (label: string) => rows.filter(([a]) => a === label).map(([, b]) => b);
		// The invented provenance of workbook-exports.ts: the standard rate first, then the own rate.
		expect(valuesOf('Utility')).toEqual(['Demo Valley Power (invented)', 'Demo Valley Power (invented)']);
		expect(valuesOf('In force')).toEqual([
			'from 1 January 2026 (no end date)',
			'from 1 July 2026 to 30 June 2027'
		]);
		expect(valuesOf('Source')).toEqual([
			'https://demo-valley.example.org/rates (invented)',
			'Own rate sheet (invented)'
		]);
		expect(valuesOf('Checked on')).toEqual(['20 November 2026', '20 November 2026']);
		// Only the imported standard rate has an open-data label.
		expect(valuesOf('Open-data label')).toEqual(['5cd0000000000000000demo (OpenEI Utility Rate Database)']);
	});
});

describe('a tariff without provenance (an export that did not give one)', () => {
	const input = exportOf(gardenRequest(), 'Birchway school garden (invented)');
	input.scenarios = input.scenarios.map((s) => ({ ...s, tariffOrigin: null }));
	const workbook = readBackOnce(input);

	it('writes no provenance rows, and the charges still follow the heading', () => {
		const words = texts(sheet(workbook(), 'Tariff'));
		expect(words).not.toContain('Utility');
		expect(words).toContain('Rate or amount');
	});
});
