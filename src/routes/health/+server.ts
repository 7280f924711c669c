import { json } from '@sveltejs/kit';
import { sql } from 'drizzle-orm';
import { db } from '$lib/server/db';
import type { RequestHandler } from './$types';

/** For load balancers and the test harness: 200 when the app and its database answer, else 503. */
export const GET: RequestHandler = async () => {
	try {
		await db.execute(sql`select 1`);
		return json({ ok: true, database: 'up' }, { headers: { 'Cache-Control': 'no-store' } });
	} catch {
		return json({ ok: false, database: 'down' }, { status: 503, headers: { 'Cache-Control': 'no-store' } });
	}
};
