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
		let answered = false;
		const hostile = request
			.post('/api/v1/calculate', { headers: { 'content-type': 'application/json' }, data })
			.finally(() => (answered = true));
		// /health, one request after another until the hostile body is answered: one of them arrives
		// while the server checks the body (before the fix one waited as long as the check, 7.5 s).
		const healthMs: number[] = [];
		while (!answered) {
			const asked = Date.now();
			const health = await request.get('/health');
			expect(health.status()).toBe(200);
			healthMs.push(Date.now() - asked);
		}
		const answer = await hostile;
		const answerMs = Date.now() - started;
		const text = await answer.text();
		const slowest = Math.max(...healthMs);
		const figures = `${(data.length / 1024).toFixed(0)} kB body: ${answer.status()} after ${answerMs} ms, answer ${text.length} bytes; ${healthMs.length} × /health, slowest ${slowest} ms`;
		test.info().annotations.push({ type: 'figures', description: figures });
		console.log(figures);
		expect(answer.status()).toBe(400);
		const issues = (JSON.parse(text) as { issues: { path: string; message: string }[] }).issues;
		expect(issues).toHaveLength(51);
		expect(issues.at(-1)?.message).toMatch(/^\d+ more problems were left out/);
		expect(text.length).toBeLessThan(20_000);
		// Generous for a busy 2-core machine.
		expect(slowest).toBeLessThan(1000);
	});
}
