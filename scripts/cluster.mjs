// Runs the production build on every core (or WORKERS of them) behind one port with node:cluster.
// The workers share the listening socket; rate-limit counts and sign-in locks are shared through
// PostgreSQL (README, "Past one machine"), so the limits hold for all workers together.
import cluster from 'node:cluster';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const workers = Number(process.env.WORKERS ?? availableParallelism());
const build = resolve(process.env.RUNRATE_BUILD_DIR || 'build', 'index.js');

if (cluster.isPrimary) {
	// One after another: each worker's start-up (the job queue's schema, for one) finishes before the next.
	let started = 0;
	const next = () => {
		if (started === workers) return console.log(`Listening on ${workers} workers`);
		started++;
		cluster.fork().once('listening', next);
	};
	next();
	cluster.on('exit', (worker, code) =>
		console.error(`[cluster] worker ${worker.process.pid} exited with ${code}`)
	);
	for (const signal of ['SIGTERM', 'SIGINT']) process.on(signal, () => process.exit(0));
} else {
	await import(pathToFileURL(build).href);
}
