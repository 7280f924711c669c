// Repeats issue 14's probes of items 1, 11 and 13 against a running Runrate on loopback, anonymously:
//   npx tsx scripts/probe-validation.ts http://127.0.0.1:4173
// Prints each probe's figures (status, time, answer size) and whether the hole is closed. Sends only to
// 127.0.0.1 / localhost; the bodies are invented.
import { probeCalculateBody, probeCalculateBodyOf } from '../tests/hostile-bodies';

const base = new URL(process.argv[2] ?? process.env.PROBE_URL ?? 'http://127.0.0.1:3000');
if (!['127.0.0.1', 'localhost', '[::1]'].includes(base.hostname)) {
	console.error(`Refusing to probe ${base.host}: loopback only.`);
	process.exit(2);
}
const at = (path: string) => new URL(path, base).toString();
const HEADERS = { 'content-type': 'application/json', 'user-agent': 'runrate-probe-validation' };
let open = 0;

function verdict(name: string, closed: boolean, figures: string) {
	if (!closed) open++;
	console.log(`${closed ? 'closed' : 'OPEN  '}  ${name}: ${figures}`);
}

/** Item 1: a hostile calculate body, with /health asked while it is being checked. */
async function hostileCalculate(name: string, body: unknown) {
	const data = JSON.stringify(body);
	const started = performance.now();
	const answer = fetch(at('/api/v1/calculate'), { method: 'POST', headers: HEADERS, body: data }).then(
		async (res) => ({ status: res.status, text: await res.text(), ms: performance.now() - started })
	);
	const health = fetch(at('/health')).then((res) => ({
		status: res.status,
		ms: performance.now() - started
	}));
	const [a, h] = await Promise.all([answer, health]);
	const issues = a.status === 400 ? (JSON.parse(a.text) as { issues: unknown[] }).issues.length : 0;
	verdict(
		`item 1, ${name}`,
		a.status === 400 && issues <= 51 && h.ms < 1000,
		`${(data.length / 1024).toFixed(0)} kB → ${a.status} in ${a.ms.toFixed(0)} ms, ${(a.text.length / 1024).toFixed(1)} kB, ${issues} issues; /health ${h.status} in ${h.ms.toFixed(0)} ms`
	);
}

/** Item 13: an API refusal asked for as HTML still answers JSON { error, message }. */
async function jsonError(name: string, method: string, path: string) {
	const res = await fetch(at(path), { method, headers: { accept: 'text/html' } });
	const text = await res.text();
	let shape = false;
	try {
		const body = JSON.parse(text) as { error?: unknown; message?: unknown };
		shape = typeof body.error === 'string' && typeof body.message === 'string';
	} catch {
		shape = false;
	}
	verdict(
		`item 13, ${name}`,
		res.status >= 400 && shape && res.headers.get('x-content-type-options') === 'nosniff',
		`${res.status} ${res.headers.get('content-type')}: ${text.slice(0, 80).replace(/\s+/g, ' ')}`
	);
}

/** Item 11: a lone surrogate in a charge label is a 400 at the field, not a 500. */
async function loneSurrogate() {
	const body = {
		period: { start: '2027-01', months: 1 },
		timezone: 'UTC',
		tariff: { currency: 'USD', energyCharges: [{ label: 'Energy \uD800', type: 'flat', perKwh: 0.1 }] },
		equipment: [{ name: 'Pump', power: { watts: 100 }, schedule: { type: 'always' } }]
	};
	const res = await fetch(at('/api/v1/calculate'), {
		method: 'POST',
		headers: HEADERS,
		body: JSON.stringify(body)
	});
	const text = await res.text();
	verdict(
		'item 11, lone surrogate in a charge label',
		res.status === 400 && text.includes('tariff.energyCharges.0.label'),
		`${res.status}: ${text.slice(0, 160)}`
	);
}

await hostileCalculate('2000 devices × 8 off-grid windows', probeCalculateBody());
await hostileCalculate('the same grown to 950 kB', probeCalculateBodyOf(950 * 1024).body);
await jsonError(
	'401 without a session',
	'GET',
	'/api/v1/sites?workspaceId=0d3e5c1a-6f2b-4c1e-9a57-5e1f00000001'
);
await jsonError('404 unknown route', 'GET', '/api/v1/no-such-thing');
await jsonError('405 unknown method', 'DELETE', '/api/v1/calculate');
await loneSurrogate();
console.log(open ? `${open} still open` : 'all closed');
process.exit(open ? 1 : 0);
