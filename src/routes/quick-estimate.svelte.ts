import type { CalculateResponse } from '$lib/calc';
import type { Issue } from './quick-estimate';

/** Debounced, cancelling fetch of /api/v1/calculate: a newer edit aborts the request still in flight. */
export class QuickEstimate {
	result = $state<CalculateResponse | null>(null);
	issues = $state<Issue[]>([]);
	failure = $state<string | null>(null);
	busy = $state(false);
	#controller: AbortController | null = null;
	#timer: ReturnType<typeof setTimeout> | null = null;

	request(body: unknown, delayMs = 250) {
		if (this.#timer) clearTimeout(this.#timer);
		this.#timer = setTimeout(() => void this.#send(body), delayMs);
	}

	async #send(body: unknown) {
		this.#controller?.abort();
		const controller = (this.#controller = new AbortController());
		this.busy = true;
		try {
			const res = await fetch('/api/v1/calculate', {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify(body),
				signal: controller.signal
			});
			const data = await res.json();
			if (res.ok) {
				this.result = data;
				this.issues = [];
				this.failure = null;
			} else {
				this.issues = data.issues ?? [];
				this.failure = data.issues?.length ? null : (data.message ?? `The estimate failed (${res.status}).`);
			}
		} catch (error) {
			if ((error as Error).name !== 'AbortError')
				this.failure = 'No answer from the server. Check the connection.';
		} finally {
			if (this.#controller === controller) this.busy = false;
		}
	}

	/** The message for one field, by the API's dotted path. */
	issueAt(path: string): string | undefined {
		return this.issues.find((i) => i.path === path)?.message;
	}
}
