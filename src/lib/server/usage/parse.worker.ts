import { parentPort, workerData } from 'node:worker_threads';

/**
 * The entry of the usage worker thread: a 10 MB Green Button file takes one to two seconds of solid
 * parsing, which on the main thread would stall every other request for as long. The main thread
 * imports this module only for its address, so the readers load inside the worker alone.
 */

/** This module's own address: the built server starts it as is, the TypeScript source through tsx. */
export const WORKER_URL = import.meta.url;
export const WORKER_MARK = 'runrate-usage-parse';

// Only a thread started for this job listens; a message sent before the readers load waits on the port.
if (parentPort && workerData === WORKER_MARK) {
	const port = parentPort;
	void import('./parse-job').then(({ answer }) =>
		port.once('message', (job) => {
			const reply = answer(job);
			const moved = 'starts' in reply ? [reply.starts.buffer, reply.seconds.buffer, reply.kwh.buffer] : [];
			port.postMessage(reply, moved as ArrayBuffer[]);
		})
	);
}
