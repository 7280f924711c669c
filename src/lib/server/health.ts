// The app's own health: whether its database answers.
import { sql } from 'drizzle-orm';
import { db } from './db';

/** Whether the database answers a trivial query; any failure (down, refused, timed out) is false. */
export async function databaseAnswers(): Promise<boolean> {
	try {
		await db.execute(sql`select 1`);
		return true;
	} catch {
		return false;
	}
}
