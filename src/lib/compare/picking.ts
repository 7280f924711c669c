// The chooser's own query parameters, read where a comparison is loaded. They work without scripts too:
// the chooser's Find, Show more and Remove buttons then submit the GET form to the page itself.

/** `picking=1`: the person is still choosing (Find, Remove), so fewer than two scenarios is no error yet. */
export const PICKING = 'picking';

/** The scenario ids in a query: one `scenarios` per ticked box, or one comma-separated value from a link. */
export const scenarioIds = (params: URLSearchParams): string[] => [
	...new Set(
		params
			.getAll('scenarios')
			.flatMap((v) => v.split(','))
			.map((id) => id.trim())
			.filter(Boolean)
	)
];

/**
 * True while the person is choosing (Find, Remove, or Show more: `shown`) and has picked fewer than two:
 * list the choices, compare nothing, say nothing is wrong.
 */
export const stillPicking = (params: URLSearchParams): boolean =>
	(params.has(PICKING) || params.has('shown')) && scenarioIds(params).length < 2;

/**
 * Where a Remove button sent without scripts leads (`remove=<id>`): the same address without that
 * scenario, still picking; null when nothing is removed. The baseline falls back to the first left.
 */
export function afterRemoval(url: URL): string | null {
	const removed = url.searchParams.getAll('remove');
	if (removed.length === 0) return null;
	const params = new URLSearchParams(url.searchParams);
	const kept = scenarioIds(params).filter((id) => !removed.includes(id));
	params.delete('remove');
	params.delete('scenarios');
	if (kept.length) params.set('scenarios', kept.join(','));
	if (removed.includes(params.get('baseline') ?? '')) params.delete('baseline');
	params.set(PICKING, '1');
	return `${url.pathname}?${params}`;
}
