import { type DaySelector, slotMask } from './clock';

/** A "not written" note: what of a Runrate tariff the open rate database's shape cannot hold. */
export interface ExportNote {
	field: string;
	message: string;
}

/** A 12 × 24 schedule being written: [month 0–11][hour 0–23] = period index. */
export type Grid = number[][];

/** A 12 × 24 grid holding `index` everywhere. */
export const filledGrid = (index: number): Grid =>
	Array.from({ length: 12 }, () => Array<number>(24).fill(index));

/**
 * The hours (0–23) the windows hold, each hour by its first quarter, and whether every hour is held
 * whole or not at all (the open rate database's schedules know only whole hours).
 */
export function windowHours(windows: readonly { start: string; end: string }[] | undefined) {
	const slots = slotMask(windows);
	const hours: number[] = [];
	let whole = true;
	for (let hour = 0; hour < 24; hour++) {
		const quarters = slots.slice(hour * 4, hour * 4 + 4);
		if (quarters[0]) hours.push(hour);
		if (quarters.some((q) => q !== quarters[0])) whole = false;
	}
	return { hours, whole };
}

/** Which of the two grids (weekday, weekend) a day selector writes. */
export const gridsOf = (days: DaySelector) =>
	days === 'all' ? ([0, 1] as const) : days === 'weekdays' ? ([0] as const) : ([1] as const);

/**
 * Period indexes for the open rate database: a label "Prefix N" keeps index N − 1 (so what was imported
 * goes back where it came from); anything else takes the lowest index still free.
 */
export class IndexBook {
	private readonly owner = new Map<number, string>();
	private readonly ofKey = new Map<string, number>();
	private readonly reserved = new Set<number>();
	constructor(private readonly prefix: RegExp) {}

	private named(label: string | null): number | null {
		const match = label ? this.prefix.exec(label) : null;
		return match ? Number(match[1]) - 1 : null;
	}

	/** Keeps the indexes these labels name free for them. */
	reserve(labels: readonly string[]) {
		for (const label of labels) {
			const index = this.named(label);
			if (index !== null) this.reserved.add(index);
		}
	}

	/** The index for a slot priced as `key`, preferring the one its label names; never one in `avoid`. */
	index(key: string, label: string | null, avoid: ReadonlySet<number> = new Set()): number {
		const wanted = this.named(label);
		if (wanted !== null && !avoid.has(wanted) && (this.owner.get(wanted) ?? key) === key)
			return this.claim(key, wanted);
		const known = this.ofKey.get(key);
		if (known !== undefined && !avoid.has(known)) return known;
		let free = 0;
		while (this.owner.has(free) || this.reserved.has(free) || avoid.has(free)) free++;
		return this.claim(key, free);
	}

	private claim(key: string, index: number) {
		this.owner.set(index, key);
		if (!this.ofKey.has(key)) this.ofKey.set(key, index);
		return index;
	}

	/** The structure: each index's entry (from its key), unused indexes below the highest priced at 0. */
	structure<T>(entry: (key: string) => T, filler: T): T[] {
		const size = this.owner.size === 0 ? 0 : Math.max(...this.owner.keys()) + 1;
		return Array.from({ length: size }, (_, i) => {
			const key = this.owner.get(i);
			return key === undefined ? filler : entry(key);
		});
	}
}
