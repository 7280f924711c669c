// "Which tariff is cheapest?" as a workbook: the ranking, the usage priced, each month's bill, the sources.
import ExcelJS from 'exceljs';
import type { CheapestFigures } from '$lib/cheapest/types';
import { monthWords } from '$lib/cheapest/words';
import { a1, SheetWriter } from './cells';
import { cheapestSourcesSheet } from './cheapest-sources-sheet';
import { formatsFor, type Formats } from './formats';
import { printSetup } from './print-setup';

/** What the workbook is made from: the priced answer and what it was about. */
export type CheapestExport = {
	siteName: string;
	/** The site's time zone, for the date the workbook was made. */
	timezone: string;
	/** "The site's metered usage" / "The scenario “Night pumping” (estimated load)". */
	load: string;
	generatedAt: string;
	figures: CheapestFigures;
};

const CAVEAT =
	'Estimates from the tariffs as stored in Runrate; check eligibility with the utility before switching.';
const RANKING_HEADERS = ['Rank', 'Tariff', 'Utility', 'Annual cost', 'Difference to the current tariff'];
const PART_HEADERS = ['Energy', 'Fixed', 'Demand', 'Current tariff'];
/** The first row of figures under the Ranking sheet's header row. */
const RANKING_FIRST = 6;
const ANNUAL_COL = 4;

/**
 * Ranking: one row a tariff, cheapest first. The difference to the current tariff is a live formula of
 * the annual costs (each row's cost minus the current row's), so a reader who edits a cost sees it follow.
 */
function rankingSheet(workbook: ExcelJS.Workbook, input: CheapestExport, formats: Formats): void {
	const w = new SheetWriter(workbook.addWorksheet('Ranking'), 'Ranking');
	const { figures } = input;
	w.widths([6, 34, 28, 14, 18, 14, 14, 14, 10]);
	w.line(1, `Which tariff is cheapest? ${input.siteName}`, 9, 'title');
	w.line(2, `${input.load}; months priced: ${figures.priced}. Amounts in ${figures.currency}.`, 9, 'note');
	w.line(3, CAVEAT, 9, 'note');
	w.headers(5, 1, [...RANKING_HEADERS, ...PART_HEADERS]);
	const currentIndex = figures.ranked.findIndex((r) => r.current);
	const currentCell = currentIndex < 0 ? null : a1(ANNUAL_COL, RANKING_FIRST + currentIndex, true);
	figures.ranked.forEach((r, i) => {
		const row = RANKING_FIRST + i;
		w.number(row, 1, i + 1, formats.whole);
		w.text(row, 2, r.name);
		w.text(row, 3, r.utility);
		w.number(row, ANNUAL_COL, r.annualCost, formats.money);
		if (currentCell)
			w.formula(row, 5, `${a1(ANNUAL_COL, row)}-${currentCell}`, r.differenceToCurrent, formats.money);
		w.number(row, 6, r.energyCost, formats.money);
		w.number(row, 7, r.fixedCost, formats.money);
		w.number(row, 8, r.demandCost, formats.money);
		if (r.current) w.text(row, 9, 'current');
	});
	const after = RANKING_FIRST + figures.ranked.length + 1;
	if (!figures.ranked.length) w.line(after, 'No tariff this site may use could price the whole year.', 9);
	else if (!currentCell)
		w.line(after, 'The site has no current tariff among those priced, so no difference is shown.', 9);
	w.freeze(5, 2);
	printSetup(w.sheet, { titleRows: '5:5' });
}

/** Usage priced: each month's kWh and peak kW, with the year's total kWh (SUM) and highest kW (MAX). */
function usageSheet(workbook: ExcelJS.Workbook, input: CheapestExport, formats: Formats): void {
	const w = new SheetWriter(workbook.addWorksheet('Usage priced'), 'Usage priced');
	const { usage } = input.figures;
	w.widths([20, 16, 18]);
	w.line(1, `The usage priced: ${input.load}`, 3, 'boldWrap');
	w.headers(3, 1, ['Month', 'Energy (kWh)', 'Peak demand (kW)']);
	usage.forEach((m, i) => {
		w.text(4 + i, 1, monthWords(m.month));
		w.number(4 + i, 2, m.kwh, formats.kwh);
		w.number(4 + i, 3, m.peakKw, formats.kw);
	});
	const total = 4 + usage.length;
	const last = total - 1;
	w.text(total, 1, 'The year (total; highest)', 'bold');
	if (usage.length) {
		const kwh = usage.reduce((sum, m) => sum + m.kwh, 0);
		w.formula(total, 2, `SUM(${a1(2, 4)}:${a1(2, last)})`, kwh, formats.kwh, 'bold');
		const peak = Math.max(...usage.map((m) => m.peakKw));
		w.formula(total, 3, `MAX(${a1(3, 4)}:${a1(3, last)})`, peak, formats.kw, 'bold');
	}
	w.freeze(3, 1);
	printSetup(w.sheet, { titleRows: '3:3' });
}

/** Monthly costs: a month a row, a ranked tariff a column (in the ranking's order), each month's bill. */
function monthlySheet(workbook: ExcelJS.Workbook, input: CheapestExport, formats: Formats): void {
	const w = new SheetWriter(workbook.addWorksheet('Monthly costs'), 'Monthly costs');
	const { usage, ranked } = input.figures;
	w.widths([20, ...ranked.map(() => 16)]);
	w.line(
		1,
		`Each month’s bill on each tariff, in ${input.figures.currency}`,
		Math.min(ranked.length + 1, 8),
		'boldWrap'
	);
	w.headers(3, 1, ['Month', ...ranked.map((r) => r.name)]);
	usage.forEach((m, i) => {
		w.text(4 + i, 1, monthWords(m.month));
		ranked.forEach((r, t) => w.number(4 + i, 2 + t, r.monthlyCosts[i] ?? null, formats.money));
	});
	w.freeze(3, 1);
	printSetup(w.sheet, {
		titleRows: '3:3',
		titleColumns: 'A:A',
		pagesWide: Math.max(1, Math.ceil(ranked.length / 8))
	});
}

/**
 * The workbook of a cheapest-tariff answer: Ranking, Usage priced, Monthly costs and Sources. Every text
 * from a person or the database goes through the sheet writer, which neutralises formula starts.
 * Bounded by the answer: at most the 100 tariffs the page prices, 12 months each.
 */
export async function cheapestWorkbook(input: CheapestExport): Promise<Buffer> {
	const workbook = new ExcelJS.Workbook();
	workbook.creator = 'Runrate';
	workbook.created = new Date(input.generatedAt);
	workbook.calcProperties.fullCalcOnLoad = true;
	const formats = formatsFor(input.figures.currency);
	rankingSheet(workbook, input, formats);
	usageSheet(workbook, input, formats);
	monthlySheet(workbook, input, formats);
	cheapestSourcesSheet(workbook, input);
	return Buffer.from(
		await workbook.xlsx.writeBuffer({ zip: { compression: 'DEFLATE', compressionOptions: { level: 1 } } })
	);
}
