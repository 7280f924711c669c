import { replaceState } from '$app/navigation';
import { LatestRequest, RequestFailed } from '$lib/client/latest-request.svelte';
import { libraryQuery } from './library-query';

export type LibraryItem = {
	id: string;
	utility: string;
	name: string;
	code: string | null;
	country: string;
	region: string | null;
	area: string | null;
	customerClass: string;
	currency: string;
	scope: 'public' | 'private';
	latestVersion: { number: number; effectiveFrom: string; checkedOn: string } | null;
	features: { tou: boolean; tiers: boolean; demand: boolean; minimum: boolean } | null;
	typicalMonthFor1Kw: number | null;
	/** The version the figure prices: the one in force today. */
	typicalMonthVersion: number | null;
};
export type LibraryResult = { page: number; pageSize: number; total: number; items: LibraryItem[] };
export type LibraryFilters = Record<
	'q' | 'country' | 'region' | 'customerClass' | 'feature' | 'scope' | 'sort',
	string
>;

/** Search-as-you-type over GET /api/v1/tariffs: debounced, a newer query cancels the one in flight. */
export class LibrarySearch {
	#latest: LatestRequest<{ filters: LibraryFilters; page: number }, LibraryResult>;

	constructor(initial: LibraryResult) {
		this.#latest = new LatestRequest({
			delayMs: 200,
			initial,
			noAnswer: 'No answer from the server. Check the connection.',
			send: async ({ filters, page }, signal) => {
				const query = libraryQuery(filters, page);
				const res = await fetch(`/api/v1/tariffs?${query}`, { signal });
				if (!res.ok) {
					const body = await res.json().catch(() => ({}));
					throw new RequestFailed(body.issues?.[0]?.message ?? 'The search failed. Try again.');
				}
				const result: LibraryResult = await res.json();
				replaceState(`/tariffs${query ? `?${query}` : ''}`, {});
				return result;
			}
		});
	}

	/** The page of tariffs last found (the server-rendered one at first). */
	get result(): LibraryResult {
		return this.#latest.value ?? { page: 1, pageSize: 20, total: 0, items: [] };
	}
	/** True while a search is on its way. */
	get busy(): boolean {
		return this.#latest.pending;
	}
	/** Why the last search found nothing, in words. */
	get failure(): string | null {
		return this.#latest.error;
	}

	search(filters: LibraryFilters, page = 1, delayMs = 200) {
		this.#latest.request({ filters, page }, delayMs);
	}
}
