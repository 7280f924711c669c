import { json } from '@sveltejs/kit';
import { databaseAnswers } from '$lib/server/health';
import type { RequestHandler } from './$types';

/** For load balancers and the test harness: 200 when the app and its database answer, else 503. */
export const GET: RequestHandler = async () => {
	if (await databaseAnswers())
		return json({ ok: true, database: 'up' }, { headers: { 'Cache-Control': 'no-store' } });
	return json({ ok: false, database: 'down' }, { status: 503, headers: { 'Cache-Control': 'no-store' } });
};
