// The Sources sheet of the cheapest-tariff workbook: what was priced, and where every tariff's rates come from.
import type ExcelJS from 'exceljs';
import { SheetWriter } from './cells';
import type { CheapestExport } from './cheapest-workbook';
import { madeText } from './formats';
import { printSetup } from './print-setup';

const HEADERS = [
	'Tariff',
	'Utility',
	'Compared',
	'Version',
	'Effective from',
	'Effective to',
	'Source',
	'Checked on',
	'Open rate database label'
];

/**
 * Sources: the site, the load and months priced and when the workbook was made, then a row for every
 * version priced of every ranked tariff (and the latest version of each tariff not compared), with the
 * version's dates, its source, when it was checked, and the open rate database's label when imported.
 */
export function cheapestSourcesSheet(workbook: ExcelJS.Workbook, input: CheapestExport): void {
	const w = new SheetWriter(workbook.addWorksheet('Sources'), 'Sources');
	w.widths([30, 26, 14, 9, 13, 13, 44, 12, 26]);
	w.line(1, 'Sources', 9, 'title');
	const about: [string, string][] = [
		['Site', input.siteName],
		['Load priced', input.load],
		['Months priced', input.figures.priced],
		['Made', madeText(input.generatedAt, input.timezone)]
	];
	about.forEach(([label, text], i) => {
		w.text(2 + i, 1, label, 'bold');
		w.text(2 + i, 2, text);
	});
	const top = 3 + about.length;
	w.headers(top, 1, HEADERS);
	let row = top + 1;
	const tariffs = [
		...input.figures.ranked.map((t) => ({ ...t, compared: 'ranked' })),
		...input.figures.unpriced.map((t) => ({ ...t, compared: 'not compared' }))
	];
	for (const t of tariffs) {
		const versions = t.provenance.versions.length ? t.provenance.versions : [null];
		for (const v of versions) {
			w.text(row, 1, t.name, 'wrap');
			w.text(row, 2, t.utility, 'wrap');
			w.text(row, 3, t.compared);
			if (v) {
				w.number(row, 4, v.number, '0');
				w.text(row, 5, v.effectiveFrom);
				w.text(row, 6, v.effectiveTo ?? 'still in force');
				w.text(row, 7, v.source, 'wrap');
				w.text(row, 8, v.checkedOn);
			} else w.text(row, 4, 'none');
			w.text(row, 9, t.provenance.urdbLabel ?? 'none (entered by hand)');
			row++;
		}
	}
	w.freeze(top, 1);
	printSetup(w.sheet, { titleRows: `${top}:${top}` });
}
