import { MONTH_NAMES } from '$lib/calc';

/** The text forms of the equipment sheet's compound cells: months, windows and yes/no. */

const MONTH_WORDS = new Map<string, number>(
	MONTH_NAMES.flatMap((name, i) => [
		[name.toLowerCase(), i + 1],
		[name.slice(0, 3).toLowerCase(), i + 1],
		[String(i + 1), i + 1]
	])
);

/** "Apr-Sep, Dec" or "4-9,12" → [4…9, 12]; a range may wrap the year ("Nov-Feb"). */
export function readMonths(text: string): { months: number[] } | { message: string } {
	const months: number[] = [];
	for (const part of text.split(/[,;]/).map((p) => p.trim().toLowerCase())) {
		if (part === '') continue;
		const ends = part.split(/\s*[-–]\s*/);
		const numbers = ends.map((end) => MONTH_WORDS.get(end));
		if (ends.length > 2 || numbers.some((n) => n === undefined)) {
			return { message: `Months: “${part}” is not a month or a range such as Apr-Sep or 4-9` };
		}
		const [from = 1, to = from] = numbers as number[];
		for (let m = from, steps = 0; steps < 12; m = (m % 12) + 1, steps++) {
			if (!months.includes(m)) months.push(m);
			if (m === to) break;
		}
	}
	if (!months.length)
		return { message: 'Months: name at least one month, or leave the cell empty for all year' };
	return { months: months.sort((a, b) => a - b) };
}

/** [4,5,6,7,8,9,12] → "Apr-Sep, Dec" (ranges of three or more months are joined). */
export function writeMonths(months: readonly number[] | undefined): string {
	if (!months || months.length === 12) return '';
	const sorted = [...months].sort((a, b) => a - b);
	const runs: number[][] = [];
	for (const m of sorted) {
		const last = runs.at(-1);
		if (last && last.at(-1) === m - 1) last.push(m);
		else runs.push([m]);
	}
	const name = (m: number) => MONTH_NAMES[m - 1]?.slice(0, 3) ?? String(m);
	return runs
		.flatMap((run) =>
			run.length >= 3 ? [`${name(run[0] ?? 1)}-${name(run.at(-1) ?? 12)}`] : run.map((m) => name(m))
		)
		.join(', ');
}

/** "06:00-09:00, 22:00-06:00" → windows; the times themselves are checked by the equipment schema. */
export function readWindows(
	text: string
): { windows: { start: string; end: string }[] } | { message: string } {
	const windows = [];
	for (const part of text.split(/[,;]/).map((p) => p.trim())) {
		if (part === '') continue;
		const match = /^(\d{1,2}:\d{2})\s*(?:-|–|to)\s*(\d{1,2}:\d{2})$/i.exec(part);
		if (!match) return { message: `Windows: “${part}” is not a window such as 06:00-09:00` };
		const pad = (time: string) => time.padStart(5, '0');
		windows.push({ start: pad(match[1] ?? ''), end: pad(match[2] ?? '') });
	}
	return { windows };
}

export const writeWindows = (windows: readonly { start: string; end: string }[] | undefined) =>
	(windows ?? []).map((w) => `${w.start}-${w.end}`).join(', ');

const YES = new Set(['yes', 'y', 'true', '1', 'x']);
const NO = new Set(['no', 'n', 'false', '0', '']);

export function readYesNo(text: string, label: string): { value: boolean } | { message: string } {
	const word = text.trim().toLowerCase();
	if (YES.has(word)) return { value: true };
	if (NO.has(word)) return { value: false };
	return { message: `${label} must be yes or no` };
}
