// The calculation endpoints' request budgets.
import { json, type RequestEvent } from '@sveltejs/kit';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { env } from '$env/dynamic/private';
import { keyHash, PerClient, PerUser } from '../rate-limit-client';
import { BatchedBudgetStore } from '../rate-limit-budget';

// These budgets are shared by every app process through PostgreSQL, batched (rate-limit-budget.ts): no
// database round trip on most requests, and past the budget at most N × (syncAt − 1) more requests
// for a key with N processes. `syncAt` is about a sixth of the smallest budget it guards.

// Anonymous callers (the public quick estimate, outside tools) share a per-client budget; signed-in
// users get a larger one.
const anonymousLimiter = new RateLimiter({
	IP: [120, 'm'],
	plugins: [new PerClient([60, 'm'])],
	store: new BatchedBudgetStore('api-anonymous', { syncAt: 10 }),
	hashFunction: keyHash
});
// MEMBER_REQUESTS_PER_MINUTE lifts the members' budget for a load test on loopback (npm run load).
const memberLimiter = new RateLimiter({
	IP: [Number(env.MEMBER_REQUESTS_PER_MINUTE ?? 600), 'm'],
	store: new BatchedBudgetStore('api-member', { syncAt: 32 }),
	hashFunction: keyHash
});

// "Which tariff is cheapest?" prices a whole year on up to 100 tariffs (the page, its report and its
// workbook alike, about 30 single calculations' work): a budget of its own, per person and per address.
const comparisonLimiter = new RateLimiter({
	IP: [240, 'm'],
	plugins: [new PerUser([60, 'm'])],
	store: new BatchedBudgetStore('which-tariff', { syncAt: 10 }),
	hashFunction: keyHash
});

/** Whether the caller has spent the which-tariff budget (each page, report or workbook counts once). */
export const tariffComparisonBudgetSpent = (event: RequestEvent): Promise<boolean> =>
	comparisonLimiter.isLimited(event);

/** Whether the caller is over its budget (members' budget if signed in); form actions answer fail(429). */
export const calculationBudgetSpent = (event: RequestEvent): Promise<boolean> =>
	(event.locals.user ? memberLimiter : anonymousLimiter).isLimited(event);

/** The 429 to send when the caller is over its budget (members' budget if signed in), else null. */
export async function overCalculationBudget(event: RequestEvent): Promise<Response | null> {
	if (!(await calculationBudgetSpent(event))) return null;
	return json(
		{ error: 'rate_limited', message: 'Too many requests. Wait a minute and try again.' },
		{ status: 429, headers: { 'Retry-After': '60' } }
	);
}
