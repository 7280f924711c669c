import { Worker } from 'node:worker_threads';
import { DECLARES_ENTITIES, declaresEntities } from './declarations';
import type { Interval, UsageRead } from './interval';
import type { ParseAnswer, ParseJob, UsageFormat } from './parse-job';

/**
 * Reading an uploaded usage file off the main thread. Parsing a year of 15-minute Green Button
 * readings (about 10 MB) takes 1.2–2.4 s of uninterrupted work on the development machine, so it
 * runs in a worker thread; the server keeps answering meanwhile.
 */

export const MAX_USAGE_BYTES = 10 * 1024 * 1024;
/** Long enough for any file under the size limit on a slow machine; a stuck parse is stopped. */
const PARSE_TIMEOUT_MS = 60_000;
/** Each parse holds a file's tree in memory; two at once keep a burst of uploads from exhausting it. */
const MAX_PARALLEL = 2;

/** Green Button files are XML: the first thing after an optional byte-order mark and spaces is "<". */
export function usageFormat(bytes: Uint8Array): UsageFormat {
	let i = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
	while (i < bytes.length && [0x20, 0x09, 0x0a, 0x0d].includes(bytes[i]!)) i++;
	return bytes[i] === 0x3c ? 'green-button' : 'csv';
}

let running = 0;
const waiting: (() => void)[] = [];

async function turn<T>(work: () => Promise<T>): Promise<T> {
	// A parse that finishes hands its place straight to the next one waiting, so none can slip in between.
	if (running < MAX_PARALLEL) running++;
	else await new Promise<void>((resolve) => waiting.push(resolve));
	try {
		return await work();
	} finally {
		const next = waiting.shift();
		if (next) next();
		else running--;
	}
}

async function startWorker(): Promise<Worker> {
	const { WORKER_URL, WORKER_MARK } = await import('./parse.worker');
	const options = { workerData: WORKER_MARK, resourceLimits: { maxOldGenerationSizeMb: 768 } };
	if (!WORKER_URL.endsWith('.ts')) return new Worker(new URL(WORKER_URL), options);
	// Under vite dev and vitest the module is TypeScript source: load it through tsx, a dev dependency
	// found from the project folder both run in.
	const url = JSON.stringify(WORKER_URL);
	const boot = `import('tsx/esm/api').then(({ tsImport }) => tsImport(${url}, ${url}))`;
	return new Worker(boot, { ...options, eval: true });
}

function run(job: ParseJob): Promise<ParseAnswer> {
	return turn(async () => {
		const worker = await startWorker();
		return new Promise<ParseAnswer>((resolve) => {
			const timer = setTimeout(() => {
				void worker.terminate();
				resolve({ error: 'Reading the file took too long; it was stopped and nothing was stored.' });
			}, PARSE_TIMEOUT_MS);
			const settle = (answer: ParseAnswer) => {
				clearTimeout(timer);
				void worker.terminate();
				resolve(answer);
			};
			worker.once('message', settle);
			worker.once('exit', () => settle({ error: 'The file could not be read; nothing was stored.' }));
			worker.once('error', (err: Error & { code?: string }) =>
				settle({
					error:
						err.code === 'ERR_WORKER_OUT_OF_MEMORY'
							? 'The file is too large to read; nothing was stored.'
							: 'The file could not be read; nothing was stored.'
				})
			);
			worker.postMessage(job, [job.bytes.buffer as ArrayBuffer]);
		});
	});
}

/**
 * The intervals of an uploaded Green Button or timestamp,kWh file, or why it was refused. The bytes
 * are handed to the worker and are unusable here afterwards. Local times of a sheet are read in
 * `timezone`.
 */
export async function readUsageFile(
	bytes: Uint8Array,
	timezone: string
): Promise<UsageRead & { format: UsageFormat }> {
	const format = usageFormat(bytes);
	if (bytes.byteLength === 0) return { format, error: 'The file is empty.' };
	if (bytes.byteLength > MAX_USAGE_BYTES) return { format, error: 'The file is over 10 MB.' };
	if (format === 'green-button' && declaresEntities(bytes)) return { format, error: DECLARES_ENTITIES };
	// Moving the bytes needs a buffer holding exactly them.
	const own = bytes.byteOffset === 0 && bytes.byteLength === bytes.buffer.byteLength ? bytes : bytes.slice();
	const answer = await run({ format, bytes: own, timezone });
	if ('error' in answer) return { format, ...answer };
	const intervals: Interval[] = Array.from(answer.starts, (ms, i) => ({
		start: new Date(ms),
		seconds: answer.seconds[i]!,
		kwh: answer.kwh[i]!
	}));
	return { format, intervals };
}
