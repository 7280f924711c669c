import { expect, test } from '@playwright/test';
import { probeCalculateBody, probeCalculateBodyOf } from '../hostile-bodies';

// Issue 14, item 1: one anonymous POST /api/v1/calculate of 2000 devices × 8 windows off the
// quarter-hour grid (about 740 kB) held the server for 7.7 s and answered a 3.7 MB list of 32,000
// problems, while GET /health waited. Now the list is capped and the server stays responsive.
// Its own user agent, so these requests count apart from the other tests' anonymous budget.
test.use({ userAgent: 'runrate-validation-cost-test' });

const BODIES: [string, unknown][] = [
	['the probe’s body', probeCalculateBody()],
	['the same kind grown to 950 kB', probeCalculateBodyOf(950 * 1024).body]
];

for (const [name, body] of BODIES) {
	test(`${name} gets a 400 with a capped list while /health answers promptly`, async ({ request }) => {
		const data = JSON.stringify(body);
		const started = Date.now();
		const hostile = request.post('/api/v1/calculate', {
			headers: { 'content-type': 'application/json' },
			data
		});
		// Sent while the hostile body is on its way or being checked.
		const health = request.get('/health').then((res) => ({ res, ms: Date.now() - started }));
		const [answer, { res: healthRes, ms: healthMs }] = await Promise.all([hostile, health]);
		const answerMs = Date.now() - started;
		const text = await answer.text();
		const figures = `${(data.length / 1024).toFixed(0)} kB body: ${answer.status()} after ${answerMs} ms, answer ${text.length} bytes; /health after ${healthMs} ms`;
		test.info().annotations.push({ type: 'figures', description: figures });
		console.log(figures);
		expect(answer.status()).toBe(400);
		const issues = (JSON.parse(text) as { issues: { path: string; message: string }[] }).issues;
		expect(issues).toHaveLength(51);
		expect(issues.at(-1)?.message).toMatch(/^\d+ more problems were left out/);
		expect(text.length).toBeLessThan(20_000);
		expect(healthRes.status()).toBe(200);
		// Generous for a busy 2-core machine; before the fix /health waited 7.5 s.
		expect(healthMs).toBeLessThan(1000);
	});
}
