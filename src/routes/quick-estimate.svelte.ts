import type { CalculateResponse } from '$lib/calc';
import { LatestRequest, RequestFailed } from '$lib/client/latest-request.svelte';
import type { toRequest } from './quick-estimate';
import type { Issue, requestIssues } from './quick-estimate-check';

/**
 * Debounced, cancelling fetch of /api/v1/calculate: a newer edit aborts the request still in flight.
 * Entries the core's schema refuses are never sent: their messages show at once, by their fields.
 */
export class QuickEstimate {
	issues = $state<Issue[]>([]);
	/** The schema check, loaded on the first edit (see quick-estimate-check.ts); null until it is here. */
	#check: typeof requestIssues | null = null;
	#loading: Promise<unknown> | null = null;
	#latest = new LatestRequest<unknown, CalculateResponse>({
		delayMs: 250,
		noAnswer: 'No answer from the server. Check the connection.',
		send: async (body, signal) => {
			const res = await fetch('/api/v1/calculate', {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify(body),
				signal
			});
			const data = await res.json();
			this.issues = res.ok ? [] : (data.issues ?? []);
			if (res.ok) return data;
			throw new RequestFailed(
				data.issues?.length ? null : (data.message ?? `The estimate failed (${res.status}).`)
			);
		}
	});

	/** The last estimate the server gave; kept while a newer edit has field issues. */
	get result(): CalculateResponse | null {
		return this.#latest.value;
	}
	/** Why there is no new estimate, in words; null while the field issues say it. */
	get failure(): string | null {
		return this.#latest.error;
	}
	/** True while a request is on its way. */
	get busy(): boolean {
		return this.#latest.pending;
	}

	/** Asks for the estimate of `body` after the pause, or, when it cannot be priced, marks its fields. */
	request(body: ReturnType<typeof toRequest>, delayMs = 250) {
		if (this.#check) return this.#checkAndSend(this.#check, body, delayMs);
		// Edits made while the check loads wait for it and run in their order, so the last one wins.
		this.#loading ??= import('./quick-estimate-check').then((m) => (this.#check = m.requestIssues));
		void this.#loading.then(() => this.#checkAndSend(this.#check!, body, delayMs));
	}

	#checkAndSend(check: typeof requestIssues, body: ReturnType<typeof toRequest>, delayMs: number) {
		const issues = check(body);
		if (issues.length) {
			this.#latest.cancel();
			this.issues = issues;
			return;
		}
		this.issues = [];
		this.#latest.request(body, delayMs);
	}

	/** The message for one field, by the API's dotted path. */
	issueAt(path: string): string | undefined {
		return this.issues.find((i) => i.path === path)?.message;
	}
}
