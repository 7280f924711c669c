import type { Handle } from '@sveltejs/kit';
import type { IncomingMessage } from 'node:http';

/**
 * Reads and drops the rest of a request body nobody read, before the answer goes out, so a client
 * still sending gets the answer instead of a reset connection.
 *
 * An upload route refuses a body declared over its limit without reading it (a 413 with the reason).
 * What happened next under adapter-node and Node 20's http server, measured with a raw http.request
 * that sends its whole body before reading the answer (as a browser's form post does): the answer was
 * written, but Node does not read the rest of a request once its answer is out (whether SvelteKit's
 * body stream had paused the request or nothing listened to it), so the client's sending stalled at
 * about 4 MB; six seconds later (the keep-alive timeout) Node destroyed the socket and the client got
 * ECONNRESET (11 MB declared), or it hung (12 MB, past BODY_SIZE_LIMIT). Answering with
 * `Connection: close` alone is no better: Node closes the socket as soon as the answer is written, and
 * bytes arriving at a closed socket make the kernel reset the connection, often before the client has
 * read the answer.
 *
 * So this hook, last to see the response, takes the request's data events over from SvelteKit's
 * unread stream and reads the rest of the body at network speed, dropping it, then lets the answer
 * go: the request is complete, the connection stays usable (keep-alive) and the client reads a clean
 * 413. The draining is bounded: a body declared over DRAIN_MAX_BYTES, or that runs past it, or that
 * takes longer than DRAIN_MAX_MS, is not waited for; its answer goes out at once with
 * `Connection: close` (a client that reads answers while sending, as curl and fetch do, still sees it;
 * one that sends everything first gets a reset: the bound is the price of not reading gigabytes).
 * Reading the rest *after* the answer (a "lingering close") does not work for the reason above, so the
 * body is read before the answer or not at all.
 * Only under adapter-node, which hands the Node request over as `platform.req`; elsewhere it does nothing.
 */

/** More than a body the server accepts at all (BODY_SIZE_LIMIT, 11 MB) and its multipart framing. */
export const DRAIN_MAX_BYTES = 16 * 1024 * 1024;
/** 16 MB at about 4.5 Mbit/s: a slow upload is waited for that long and no longer. */
export const DRAIN_MAX_MS = 30_000;

/**
 * Reads the rest of `request` and drops it: true once it has all arrived, false when more than
 * `maxBytes` came or it took longer than `maxMs` (the request is then paused, the rest unread).
 */
export function drainBody(request: IncomingMessage, maxBytes: number, maxMs: number): Promise<boolean> {
	return new Promise((resolve) => {
		let bytes = 0;
		const finish = (complete: boolean) => {
			clearTimeout(timer);
			request.off('data', count).off('end', ended).off('error', broken).off('close', closed);
			if (!complete) request.pause();
			resolve(complete);
		};
		const count = (chunk: Buffer) => {
			bytes += chunk.byteLength;
			if (bytes > maxBytes) finish(false);
		};
		const ended = () => finish(true);
		const broken = () => finish(false);
		const closed = () => finish(request.complete);
		const timer = setTimeout(() => finish(false), maxMs);
		// SvelteKit's body stream listens for data and waits for a reader that will never come.
		request.removeAllListeners('data');
		request.on('data', count).once('end', ended).once('error', broken).once('close', closed);
		request.resume();
	});
}

/** The response with `Connection: close` (copied first: a redirect's headers cannot be changed). */
function closing(response: Response): Response {
	const headers = new Headers(response.headers);
	headers.set('connection', 'close');
	return new Response(response.body, { status: response.status, statusText: response.statusText, headers });
}

export const finishReadingBody: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const request = (event.platform as { req?: IncomingMessage } | undefined)?.req;
	if (!request || request.complete || request.destroyed) return response;
	const declared = Number(request.headers['content-length']);
	if (!(declared > DRAIN_MAX_BYTES) && (await drainBody(request, DRAIN_MAX_BYTES, DRAIN_MAX_MS)))
		return response;
	return closing(response);
};
