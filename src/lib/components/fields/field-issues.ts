import type { RequestIssue } from '$lib/calc';

/** One problem at a dotted path ("energyCharges.0.perKwh", "power.amps"), from the client's check or the server's. */
export type FieldIssue = RequestIssue;

/** Client and server issues together, each path and message once, so no message shows twice. */
export function mergeIssues(...lists: ReadonlyArray<readonly FieldIssue[]>): FieldIssue[] {
	const seen = new Set<string>();
	return lists.flat().filter((issue) => {
		const key = `${issue.path}\u0000${issue.message}`;
		if (seen.has(key)) return false;
		seen.add(key);
		return true;
	});
}

/** Messages for exactly this path: what one box shows beside itself. */
export function messagesAt(issues: readonly FieldIssue[], path: string): string[] {
	return issues.filter((issue) => issue.path === path).map((issue) => issue.message);
}

/** Messages for this path and everything inside it (a month row, a list of windows). */
export function messagesUnder(issues: readonly FieldIssue[], path: string): string[] {
	return issues
		.filter((issue) => issue.path === path || issue.path.startsWith(`${path}.`))
		.map((issue) => issue.message);
}

/**
 * A box's `aria-describedby`: the ids of the parts it has (`hint`, `error`), in the order given, so a
 * screen reader reads the hint and the messages with the label; undefined when it has none.
 */
export function describedBy(
	id: string,
	...parts: ReadonlyArray<string | false | undefined>
): string | undefined {
	return (
		parts
			.filter((part): part is string => Boolean(part))
			.map((part) => `${id}-${part}`)
			.join(' ') || undefined
	);
}
