// Reads a V8 .cpuprofile (node --cpu-prof) into self time per function and per package, for
// profile-request.mjs. The profile's format: nodes[] (id, callFrame), samples[] (a node id per tick) and
// timeDeltas[] (µs since the tick before); startTime is µs on the monotonic clock process.hrtime reads.
// Ticks are counted, not their time deltas: on a busy machine a delta also holds the time the process
// waited for a core, which would be charged to whatever function happened to be running; a tick is
// taken only while the process runs, so the count follows CPU time.
import { readFileSync } from 'node:fs';
import { root } from './lib.mjs';

/** Where a function lives, short: a package and file, the app's bundle chunk, or Node's own module. */
function place(url) {
	if (!url) return '';
	const path = url.replace(/^file:\/\//, '').replace(`${root}/`, '');
	const inPackage = path.match(/node_modules\/((?:@[^/]+\/)?[^/]+)\/(?:.*\/)?([^/]+)$/);
	if (inPackage) return `${inPackage[1]} ${inPackage[2]}`;
	return path.replace(/^.*?\/server\//, 'app ');
}

/** The package a place belongs to, for the roll-up: a package name, "app", "node" or a V8 bucket. */
function area(name, where) {
	if (!where) return name.startsWith('(') ? name : 'V8 / native';
	if (where.startsWith('node:')) return 'node';
	return where.split(' ')[0];
}

/**
 * The steps of a request (a calculation; a page adds its queries and its render), each named by the outermost function of the step found on a
 * tick's stack (function name, and where it lives). Ticks in none of them are the framework's and
 * Node's own: HTTP parsing, streams, SvelteKit's handling, the hooks.
 */
const STEPS = [
	[
		'rate limit (its keys hashed with WebCrypto)',
		/^_?isLimited\t|\tnode:internal\/crypto|webcrypto|js_transferable/
	],
	['session (Auth.js reader)', /^auth\t.*auth\.js/],
	['session (live check, database)', /^liveSessionUser\t/],
	["database (a page's queries: drizzle, postgres.js)", /node_modules\/(drizzle-orm|postgres)\//],
	['page render and its data for hydration (SvelteKit)', /^render_response\t/],
	['reading the body (and JSON.parse)', /^readJsonBody\t/],
	['validation (zod)', /^parseRequest\t/],
	['calculation core', /^calculateAcrossVersions\t/],
	['encoding the answer (JSON.stringify)', /^jsonBody\t/]
];

/** The step a tick belongs to: garbage collection, the outermost step on its stack, or "the rest". */
function stepOf(frames, parent, id) {
	if (frames.get(id).functionName === '(garbage collector)') return 'garbage collection';
	let step = 'framework and Node (HTTP, streams, SvelteKit, hooks)';
	for (let at = id; at !== undefined; at = parent.get(at)) {
		const frame = frames.get(at);
		const key = `${frame.functionName}\t${frame.url}`;
		const found = STEPS.find(([, pattern]) => pattern.test(key));
		if (found) step = found[0];
	}
	return step;
}

/**
 * Ticks by function+file, by area and by step, counting only those between `fromUs` and `toUs` (the
 * measured load run, not start-up or warm-up). Idle ticks are left out of the totals.
 */
export function selfTimes(file, fromUs = -Infinity, toUs = Infinity) {
	const profile = JSON.parse(readFileSync(file, 'utf8'));
	const frames = new Map(profile.nodes.map((n) => [n.id, n.callFrame]));
	const parent = new Map(profile.nodes.flatMap((n) => (n.children ?? []).map((child) => [child, n.id])));
	const byFunction = new Map();
	const byStep = new Map();
	const byArea = new Map();
	let at = profile.startTime;
	let total = 0;
	for (let i = 0; i < profile.samples.length; i++) {
		at += profile.timeDeltas[i];
		const spent = 1;
		if (at < fromUs || at > toUs) continue;
		const frame = frames.get(profile.samples[i]);
		const name = frame.functionName || '(anonymous)';
		if (name === '(idle)') continue;
		const where = place(frame.url);
		const key = `${name}\t${where}`;
		byFunction.set(key, (byFunction.get(key) ?? 0) + spent);
		const group = area(name, where);
		byArea.set(group, (byArea.get(group) ?? 0) + spent);
		const step = stepOf(frames, parent, profile.samples[i]);
		byStep.set(step, (byStep.get(step) ?? 0) + spent);
		total += spent;
	}
	const sorted = (map) => [...map].sort((a, b) => b[1] - a[1]);
	return { total, byFunction: sorted(byFunction), byArea: sorted(byArea), byStep: sorted(byStep) };
}
