import { replaceState } from '$app/navigation';
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
};
export type LibraryResult = { page: number; pageSize: number; total: number; items: LibraryItem[] };
export type LibraryFilters = Record<
	'q' | 'country' | 'region' | 'customerClass' | 'feature' | 'scope' | 'sort',
	string
>;

/** Search-as-you-type over GET /api/v1/tariffs: debounced, a newer query cancels the one in flight. */
export class LibrarySearch {
	result = $state<LibraryResult>({ page: 1, pageSize: 20, total: 0, items: [] });
	busy = $state(false);
	failure = $state<string | null>(null);
	#controller: AbortController | null = null;
	#timer: ReturnType<typeof setTimeout> | null = null;

	constructor(initial: LibraryResult) {
		this.result = initial;
	}

	search(filters: LibraryFilters, page = 1, delayMs = 200) {
		if (this.#timer) clearTimeout(this.#timer);
		this.#timer = setTimeout(() => void this.#fetch(filters, page), delayMs);
	}

	async #fetch(filters: LibraryFilters, page: number) {
		this.#controller?.abort();
		const controller = (this.#controller = new AbortController());
		const query = libraryQuery(filters, page);
		this.busy = true;
		try {
			const res = await fetch(`/api/v1/tariffs?${query}`, { signal: controller.signal });
			if (!res.ok) {
				const body = await res.json().catch(() => ({}));
				this.failure = body.issues?.[0]?.message ?? 'The search failed. Try again.';
				return;
			}
			this.result = await res.json();
			this.failure = null;
			replaceState(`/tariffs${query ? `?${query}` : ''}`, {});
		} catch (error) {
			if ((error as Error).name !== 'AbortError')
				this.failure = 'No answer from the server. Check the connection.';
		} finally {
			if (this.#controller === controller) this.busy = false;
		}
	}
}
