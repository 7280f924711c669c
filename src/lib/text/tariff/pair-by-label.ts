/** Pairing two versions' charges by label, for the version history. */
export interface Labelled {
	label: string;
}

export interface ListWords<T> {
	added: (item: T) => string;
	removed: (item: T) => string;
	changed: (before: T, after: T) => string[];
}

/** Pairs two versions' items by label (case and spaces ignored; repeated labels pair in order). */
export function diffList<T extends Labelled>(
	before: readonly T[],
	after: readonly T[],
	words: ListWords<T>
): string[] {
	const key = (item: T) => item.label.trim().toLowerCase();
	const left = [...before];
	const lines = after.flatMap((item) => {
		const i = left.findIndex((old) => key(old) === key(item));
		const [old] = i < 0 ? [] : left.splice(i, 1);
		return old ? words.changed(old, item) : [words.added(item)];
	});
	return [...lines, ...left.map(words.removed)];
}
