/**
 * The bulk import's running tally and final report, kept small whatever the file: counts for every rate,
 * and lists of at most a few hundred entries (each reason cut to a sentence's length), so the job's
 * stored output and the status answer stay a few hundred kB at most.
 */

export type RateRef = { label: string | null; name: string | null };
export type ImportedRate = RateRef & { id: string };

export type BulkReport = {
	/** 'reading' while the job runs; 'done' at the end of the list; 'stopped' when the file broke off. */
	phase: 'reading' | 'done' | 'stopped';
	bytesRead: number;
	bytesTotal: number;
	read: number;
	imported: number;
	skipped: number;
	present: number;
	filteredBySector: number;
	filteredByUtility: number;
	importedList: ImportedRate[];
	presentList: ImportedRate[];
	skippedList: (RateRef & { index: number; reasons: string[] })[];
	/** Imported rates some of whose parts were not taken as they stand (the import's notes). */
	notesList: (ImportedRate & { notes: string[] })[];
	/** Entries past the lists' limits: counted above, not listed. */
	unlisted: number;
	/** Why the reading stopped, in words (phase 'stopped'). */
	message: string | null;
};

export const LIST_LIMITS = { imported: 25, present: 100, skipped: 300, notes: 300 } as const;
const REASONS_PER_RATE = 8;
const REASON_CHARS = 300;

export const emptyReport = (bytesTotal: number): BulkReport => ({
	phase: 'reading',
	bytesRead: 0,
	bytesTotal,
	read: 0,
	imported: 0,
	skipped: 0,
	present: 0,
	filteredBySector: 0,
	filteredByUtility: 0,
	importedList: [],
	presentList: [],
	skippedList: [],
	notesList: [],
	unlisted: 0,
	message: null
});

const cut = (text: string | null, max: number) =>
	text === null || text.length <= max ? text : `${text.slice(0, max - 1)}…`;

/** Reasons as the report keeps them: at most eight, each at most 300 characters, the rest counted. */
export function keptReasons(reasons: string[]): string[] {
	const kept = reasons.slice(0, REASONS_PER_RATE).map((r) => cut(r, REASON_CHARS)!);
	const more = reasons.length - kept.length;
	return more > 0 ? [...kept, `and ${more} more ${more === 1 ? 'problem' : 'problems'}`] : kept;
}

const ref = (rate: RateRef): RateRef => ({ label: cut(rate.label, 200), name: cut(rate.name, 200) });

/** Appends to a list within its limit; past it the entry is only counted. */
function listed<T>(report: BulkReport, list: T[], limit: number, entry: T) {
	if (list.length < limit) list.push(entry);
	else report.unlisted += 1;
}

export function countImported(report: BulkReport, rate: ImportedRate, notes: string[]) {
	report.imported += 1;
	listed(report, report.importedList, LIST_LIMITS.imported, { ...ref(rate), id: rate.id });
	if (notes.length)
		listed(report, report.notesList, LIST_LIMITS.notes, {
			...ref(rate),
			id: rate.id,
			notes: keptReasons(notes)
		});
}

export function countPresent(report: BulkReport, rate: ImportedRate) {
	report.present += 1;
	listed(report, report.presentList, LIST_LIMITS.present, { ...ref(rate), id: rate.id });
}

export function countSkipped(report: BulkReport, rate: RateRef, index: number, reasons: string[]) {
	report.skipped += 1;
	listed(report, report.skippedList, LIST_LIMITS.skipped, {
		...ref(rate),
		index,
		reasons: keptReasons(reasons)
	});
}
