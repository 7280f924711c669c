/**
 * An answer the server gave that is not the value asked for, in words for the page ("The search
 * failed. Try again."); `null` when the page shows the failure some other way (field messages).
 */
export class RequestFailed extends Error {
	constructor(readonly words: string | null) {
		super(words ?? 'The request failed.');
	}
}

type Options<Input, Value> = {
	/** The pause after the last change before asking: typing fast sends one request, not one a key. */
	delayMs: number;
	/** Asks the server; throws `RequestFailed` for an answer that is not a value. */
	send: (input: Input, signal: AbortSignal) => Promise<Value>;
	/** The words when no answer comes at all (offline, server down). */
	noAnswer: string;
	/** The value before the first answer (a page's server-rendered first result). */
	initial?: Value | null;
};

/**
 * The latest of a stream of requests a page makes as the user types or picks: each change waits
 * `delayMs`, and the request it starts cancels the one still in flight, so an older, slower answer
 * never overwrites a newer one. Holds the last value, the failure in words, and whether a request
 * is on its way (for `aria-busy`).
 */
export class LatestRequest<Input, Value> {
	value = $state.raw<Value | null>(null);
	error = $state<string | null>(null);
	pending = $state(false);
	#controller: AbortController | null = null;
	#timer: ReturnType<typeof setTimeout> | null = null;

	constructor(private readonly options: Options<Input, Value>) {
		this.value = options.initial ?? null;
	}

	/** Asks for `input` after the pause (at once when the pause is 0), dropping a request still waiting. */
	request(input: Input, delayMs = this.options.delayMs): void {
		if (this.#timer) clearTimeout(this.#timer);
		this.#timer = null;
		if (delayMs <= 0) void this.#send(input);
		else this.#timer = setTimeout(() => void this.#send(input), delayMs);
	}

	/** Drops the request waiting and cancels the one in flight; what the page shows stays as it is. */
	cancel(): void {
		if (this.#timer) clearTimeout(this.#timer);
		this.#timer = null;
		this.#controller?.abort();
		this.#controller = null;
	}

	/** Cancels everything and forgets the value and the failure, as when there is nothing to ask. */
	clear(): void {
		this.cancel();
		this.value = null;
		this.error = null;
		this.pending = false;
	}

	async #send(input: Input): Promise<void> {
		this.#controller?.abort();
		const controller = (this.#controller = new AbortController());
		const { signal } = controller;
		this.pending = true;
		try {
			const value = await this.options.send(input, signal);
			if (signal.aborted) return;
			this.value = value;
			this.error = null;
		} catch (error) {
			// An abort lands here too; only a request still wanted reports its failure.
			if (signal.aborted) return;
			this.error = error instanceof RequestFailed ? error.words : this.options.noAnswer;
		} finally {
			if (this.#controller === controller) this.pending = false;
		}
	}
}
