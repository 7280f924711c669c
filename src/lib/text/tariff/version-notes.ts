import { MONTH_NAMES } from '$lib/calc';

/**
 * The note beside figures priced partly before a tariff's first version:
 * "January–November 2026 priced on version 1, which starts 2026-12-03".
 */

const monthLabel = /^(\d{4})-(\d{2})$/;

/** "January–November 2026", "December 2025–March 2026", "March 2026"; billing periods as "from to to". */
export function periodsText(labels: readonly string[]): string {
	const first = labels[0] ?? '';
	const last = labels.at(-1) ?? first;
	const a = monthLabel.exec(first);
	const b = monthLabel.exec(last);
	if (!a || !b) return `${first.split('/')[0]} to ${last.split('/').at(-1)}`;
	const name = (m: RegExpExecArray) => MONTH_NAMES[Number(m[2]) - 1] ?? m[2];
	if (first === last) return `${name(a)} ${a[1]}`;
	if (a[1] === b[1]) return `${name(a)}–${name(b)} ${a[1]}`;
	return `${name(a)} ${a[1]}–${name(b)} ${b[1]}`;
}

/** The note itself, from the core's `beforeFirst` of a priced result. */
export function beforeFirstVersionNote(beforeFirst: {
	labels: readonly string[];
	number: number;
	effectiveFrom: string;
}): string {
	const verb = beforeFirst.labels.length === 1 ? 'is' : 'are';
	return `${periodsText(beforeFirst.labels)} ${verb} priced on version ${beforeFirst.number}, which starts ${beforeFirst.effectiveFrom}: the tariff has no earlier rates.`;
}
