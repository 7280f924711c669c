import { LatestRequest, RequestFailed } from '$lib/client/latest-request.svelte';
import { type LibraryItem, type PublicFound, tariffSearchQuery } from './tariff-choice';

/**
 * The public library searched as the person types, through GET /api/v1/tariffs (public tariffs only, 50
 * at most): a newer search cancels the one in flight. Without scripts the form's Find button asks the page
 * itself (`?tariffs=`), which answers the same way.
 */
export class TariffSearch {
	#latest: LatestRequest<string, PublicFound>;

	constructor(initial: PublicFound) {
		this.#latest = new LatestRequest({
			delayMs: 250,
			initial,
			noAnswer: 'No answer from the server. Check the connection.',
			send: async (search, signal) => {
				const res = await fetch(`/api/v1/tariffs?${tariffSearchQuery(search)}`, { signal });
				if (!res.ok) {
					const body = await res.json().catch(() => ({}));
					throw new RequestFailed(body.issues?.[0]?.message ?? 'The search failed. Try again.');
				}
				const body: { total: number; items: LibraryItem[] } = await res.json();
				return {
					search,
					found: body.total,
					choices: body.items.map((t) => ({
						id: t.id,
						label: `${t.utility} — ${t.name}`,
						currency: t.currency,
						versions: t.versions
					}))
				};
			}
		});
	}

	/** Searches after the typing pause, or at once (`now`: the Find button, Enter). */
	find(search: string, now = false): void {
		this.#latest.request(search.trim().slice(0, 100), now ? 0 : undefined);
	}

	get result(): PublicFound | null {
		return this.#latest.value;
	}
	get busy(): boolean {
		return this.#latest.pending;
	}
	get failure(): string | null {
		return this.#latest.error;
	}
}
