import JSZip from 'jszip';
import { beforeAll, describe, expect, it } from 'vitest';
import { comparisonWorkbook } from './comparison-workbook';
import { exportOf, largeExport } from './workbook-exports';
import { hatcheryRequest } from './workbook-fixtures';

/**
 * The file as the streaming writer leaves it (workbook-file.ts), read as raw XML: what that writer
 * fixes early or leaves out must still be in it, as the workbook held in memory wrote it before.
 */
async function parts(buffer: Buffer): Promise<{ workbook: string; sheets: string[] }> {
	const zip = await JSZip.loadAsync(buffer);
	const sheets = zip.file(/^xl\/worksheets\/sheet\d+\.xml$/);
	return {
		workbook: (await zip.file('xl/workbook.xml')?.async('string')) ?? '',
		sheets: await Promise.all(sheets.map((sheet) => sheet.async('string')))
	};
}

/** "AB12" as a column and row number. */
function position(address: string): { col: number; row: number } {
	const [, letters = '', digits = '0'] = /^([A-Z]+)(\d+)$/.exec(address) ?? [];
	const col = [...letters].reduce((n, letter) => n * 26 + letter.charCodeAt(0) - 64, 0);
	return { col, row: Number(digits) };
}

describe('the written file of a comparison', () => {
	let file: { workbook: string; sheets: string[] };
	beforeAll(async () => {
		file = await parts(await comparisonWorkbook(exportOf(hatcheryRequest(), 'Hatchery (invented)')));
	});

	it('asks programs that keep cached results to recalculate it on opening, once', () => {
		expect(file.workbook.match(/<calcPr[^>]*>/g)).toEqual(['<calcPr calcId="171027" fullCalcOnLoad="1"/>']);
	});

	it('keeps each sheet’s print area, its repeated title rows, fitting and frozen panes', () => {
		const names = (kind: string) => file.workbook.match(new RegExp(`name="_xlnm.${kind}"`, 'g')) ?? [];
		expect(names('Print_Area')).toHaveLength(file.sheets.length);
		expect(names('Print_Titles')).toHaveLength(file.sheets.length - 1);
		expect(file.workbook).toContain('&apos;Summary&apos;!$1:$4</definedName>');
		expect(file.workbook).toContain('&apos;Monthly&apos;!$A:$B,&apos;Monthly&apos;!$3:$4</definedName>');
		for (const sheet of file.sheets) expect(sheet).toContain('<pageSetUpPr fitToPage="1"/>');
		const frozen = file.sheets.filter((sheet) => /<pane [^>]*state="frozen"/.test(sheet));
		expect(frozen).toHaveLength(file.sheets.length - 1);
	});
});

describe('the shared formulas of 6 scenarios × 200 devices', () => {
	// The streaming writer numbers shared formulas afresh on each row (cells.ts, `master`): two masters
	// with one number would make a program take a copy for the wrong formula.
	it('each has one master, and its copies lie within the master’s range', async () => {
		const { sheets } = await parts(await comparisonWorkbook(largeExport()));
		let copies = 0;
		for (const sheet of sheets) {
			const masters = new Map<string, Array<{ from: string; to: string }>>();
			for (const [, from = '', to = '', si = ''] of sheet.matchAll(
				/<f t="shared" ref="([A-Z]+\d+):([A-Z]+\d+)" si="(\d+)">/g
			))
				masters.set(si, [...(masters.get(si) ?? []), { from, to }]);
			for (const [si, found] of masters) expect(found, `shared formula ${si}`).toHaveLength(1);
			for (const [, address = '', si = ''] of sheet.matchAll(
				/<c r="([A-Z]+\d+)"[^>]*><f t="shared" si="(\d+)"\/>/g
			)) {
				const [master] = masters.get(si) ?? [];
				if (!master) throw new Error(`${address} copies shared formula ${si}, which has no master`);
				const [at, from, to] = [position(address), position(master.from), position(master.to)];
				const within = at.col >= from.col && at.col <= to.col && at.row >= from.row && at.row <= to.row;
				expect(within, `${address} within ${master.from}:${master.to}`).toBe(true);
				copies++;
			}
		}
		// 6 sheets × (199 copies down × 7 single columns + 200 × 12 − 1 per month block × 2).
		expect(copies).toBe(6 * (199 * 7 + (200 * 12 - 1) * 2));
	}, 30_000);
});
