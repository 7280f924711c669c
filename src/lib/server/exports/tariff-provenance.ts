// Where a tariff version on the workbook's Tariff sheet comes from: one label and value a row.
import { dayInWords, inForceSpan } from '$lib/compare/provenance';
import type { SheetWriter } from './cells';

/** A tariff version's provenance as the comparison carries it (the tariff's and the version's rows). */
export interface TariffOrigin {
	utility: string;
	effectiveFrom: string;
	effectiveTo: string | null;
	source: string;
	checkedOn: string;
	/** The open rate database's label; null for a tariff typed in. */
	urdbLabel: string | null;
}

/**
 * Writes the provenance rows from `row` on: the label in column A, the value across B to F. Each value
 * is a cell of its own written as text by the sheet writer, so a source typed as a formula stays text.
 * Answers the next free row.
 */
export function writeTariffOrigin(out: SheetWriter, origin: TariffOrigin, row: number): number {
	const lines: Array<[string, string]> = [
		['Utility', origin.utility],
		['In force', inForceSpan(origin.effectiveFrom, origin.effectiveTo)],
		['Source', origin.source || 'No source given'],
		['Checked on', origin.checkedOn ? dayInWords(origin.checkedOn) : 'Not given']
	];
	if (origin.urdbLabel) lines.push(['Open-data label', `${origin.urdbLabel} (OpenEI Utility Rate Database)`]);
	lines.forEach(([label, value], i) => {
		out.text(row + i, 1, label, 'bold');
		out.text(row + i, 2, value, 'wrap');
		out.sheet.mergeCells(row + i, 2, row + i, 6);
	});
	return row + lines.length;
}
