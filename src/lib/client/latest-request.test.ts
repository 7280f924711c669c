import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { LatestRequest, RequestFailed } from './latest-request.svelte';

/** A send whose answers the test hands out one by one, and which rejects as fetch does on abort. */
function fakeServer() {
	const calls: {
		input: string;
		signal: AbortSignal;
		answer: (v: string) => void;
		fail: (e: Error) => void;
	}[] = [];
	const send = (input: string, signal: AbortSignal) =>
		new Promise<string>((resolve, reject) => {
			signal.addEventListener('abort', () => reject(new DOMException('aborted', 'AbortError')));
			calls.push({ input, signal, answer: resolve, fail: reject });
		});
	/** The nth request sent; fails the test when there is none. */
	const call = (n: number) => {
		const found = calls[n];
		if (!found) throw new Error(`no request ${n} was sent`);
		return found;
	};
	return { calls, call, send };
}

const flush = () => new Promise<void>((resolve) => queueMicrotask(resolve)).then(() => Promise.resolve());

describe('LatestRequest', () => {
	beforeEach(() => vi.useFakeTimers());
	afterEach(() => vi.useRealTimers());

	it('waits the pause after the last change, then sends one request', async () => {
		const server = fakeServer();
		const latest = new LatestRequest({ delayMs: 250, send: server.send, noAnswer: 'No answer.' });
		latest.request('a');
		vi.advanceTimersByTime(200);
		latest.request('ab');
		vi.advanceTimersByTime(249);
		expect(server.calls).toHaveLength(0);
		vi.advanceTimersByTime(1);
		expect(server.calls.map((c) => c.input)).toEqual(['ab']);
		expect(latest.pending).toBe(true);
		server.call(0).answer('AB');
		await flush();
		expect(latest.value).toBe('AB');
		expect(latest.error).toBeNull();
		expect(latest.pending).toBe(false);
	});

	it('cancels the request in flight when a newer one starts, and keeps only the newer answer', async () => {
		const server = fakeServer();
		const latest = new LatestRequest({ delayMs: 100, send: server.send, noAnswer: 'No answer.' });
		latest.request('old');
		vi.advanceTimersByTime(100);
		latest.request('new');
		vi.advanceTimersByTime(100);
		expect(server.call(0).signal.aborted).toBe(true);
		server.call(1).answer('NEW');
		await flush();
		expect(latest.value).toBe('NEW');
		expect(latest.error).toBeNull();
		expect(latest.pending).toBe(false);
	});

	it('says the failure in words and keeps the last value', async () => {
		const server = fakeServer();
		const latest = new LatestRequest({
			delayMs: 0,
			send: server.send,
			noAnswer: 'No answer.',
			initial: 'first'
		});
		latest.request('x');
		server.call(0).fail(new RequestFailed('The search failed.'));
		await flush();
		expect(latest.error).toBe('The search failed.');
		expect(latest.value).toBe('first');
		latest.request('y');
		server.call(1).fail(new TypeError('Failed to fetch'));
		await flush();
		expect(latest.error).toBe('No answer.');
		expect(latest.pending).toBe(false);
	});

	it('starts at once when the pause is 0', () => {
		const server = fakeServer();
		const latest = new LatestRequest({ delayMs: 0, send: server.send, noAnswer: 'No answer.' });
		latest.request('now');
		expect(server.calls).toHaveLength(1);
		expect(latest.pending).toBe(true);
	});

	it('cancel drops the waiting request and aborts the one in flight but leaves what is shown', async () => {
		const server = fakeServer();
		const latest = new LatestRequest({
			delayMs: 50,
			send: server.send,
			noAnswer: 'No answer.',
			initial: 'shown'
		});
		latest.request('a');
		vi.advanceTimersByTime(50);
		latest.request('b');
		latest.cancel();
		vi.advanceTimersByTime(100);
		await flush();
		expect(server.calls).toHaveLength(1);
		expect(server.call(0).signal.aborted).toBe(true);
		expect(latest.value).toBe('shown');
		expect(latest.error).toBeNull();
		expect(latest.pending).toBe(true);
	});

	it('clear forgets the value, the failure and the pending request', async () => {
		const server = fakeServer();
		const latest = new LatestRequest({
			delayMs: 0,
			send: server.send,
			noAnswer: 'No answer.',
			initial: 'shown'
		});
		latest.request('a');
		latest.clear();
		await flush();
		expect(server.call(0).signal.aborted).toBe(true);
		expect(latest.value).toBeNull();
		expect(latest.error).toBeNull();
		expect(latest.pending).toBe(false);
	});
});
