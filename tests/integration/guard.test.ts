import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { memberships } from '$lib/server/db/schema';
import { requireRole, type Role } from '$lib/server/guard';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { makeUser } from './fixtures';

const tag = `guard-${Date.now()}`;
const people: Record<string, SessionUser> = {};
let wsA = '';
let wsB = '';

function eventFor(user: SessionUser | null, path = '/w/x', method = 'GET'): RequestEvent {
	return {
		locals: { user },
		url: new URL(`http://127.0.0.1${path}`),
		request: new Request(`http://127.0.0.1${path}`, { method })
	} as unknown as RequestEvent;
}

/** The statements `work` sends, with the options drizzle passed, counted at the database client. */
async function sent(work: () => Promise<unknown>) {
	const original = client.unsafe;
	const seen: { query: string; prepare: unknown }[] = [];
	client.unsafe = ((...args: Parameters<typeof original>) => {
		seen.push({ query: String(args[0]), prepare: (args[2] as { prepare?: boolean })?.prepare });
		return original.apply(client, args);
	}) as typeof original;
	try {
		await work();
	} finally {
		client.unsafe = original;
	}
	return seen;
}

async function statusOf(promise: Promise<unknown>): Promise<number> {
	try {
		await promise;
		return 200;
	} catch (e) {
		return (e as { status: number }).status;
	}
}

beforeAll(async () => {
	for (const name of ['owner', 'editor', 'viewer', 'outsider']) {
		people[name] = await makeUser(`${name}-${tag}@example.org`, name);
	}
	wsA = await createWorkspace(`A ${tag}`, people.owner!.id);
	wsB = await createWorkspace(`B ${tag}`, people.outsider!.id);
	await db.insert(memberships).values([
		{ workspaceId: wsA, userId: people.editor!.id, role: 'editor' },
		{ workspaceId: wsA, userId: people.viewer!.id, role: 'viewer' }
	]);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('requireRole, the one authorization check', () => {
	const table: [string, Role, number][] = [
		['owner', 'owner', 200],
		['owner', 'viewer', 200],
		['editor', 'editor', 200],
		['editor', 'owner', 403],
		['viewer', 'viewer', 200],
		['viewer', 'editor', 403],
		['outsider', 'viewer', 404],
		['outsider', 'owner', 404]
	];
	it.each(table)('%s asking for %s in workspace A gets %i', async (who, needed, expected) => {
		expect(await statusOf(requireRole(eventFor(people[who]!), wsA, needed))).toBe(expected);
	});

	it('answers 404 for a workspace id that is not a UUID, before touching the database', async () => {
		expect(await statusOf(requireRole(eventFor(people.owner!), "1' or '1'='1", 'viewer'))).toBe(404);
	});

	it('sends an anonymous page visit to sign-in and an anonymous post or API call to 401', async () => {
		expect(await statusOf(requireRole(eventFor(null), wsA, 'viewer'))).toBe(303);
		expect(await statusOf(requireRole(eventFor(null, '/api/v1/anything'), wsA, 'viewer'))).toBe(401);
	});

	it('gives the owner of workspace B nothing of workspace A', async () => {
		expect(await statusOf(requireRole(eventFor(people.outsider!), wsB, 'owner'))).toBe(200);
		expect(await statusOf(requireRole(eventFor(people.outsider!), wsA, 'viewer'))).toBe(404);
	});
});

describe('the membership lookup', () => {
	it('is made once for a GET request whose layout and page both check it', async () => {
		const event = eventFor(people.editor!);
		const statements = await sent(() =>
			Promise.all([requireRole(event, wsA, 'viewer'), requireRole(event, wsA, 'editor')])
		);
		expect(statements).toHaveLength(1);
		// Another request looks again: nothing is kept past the request.
		expect(await sent(() => requireRole(eventFor(people.editor!), wsA, 'viewer'))).toHaveLength(1);
	});

	it('is made again within a form post, whose action may have changed the membership', async () => {
		const event = eventFor(people.viewer!, '/w/x', 'POST');
		expect(await statusOf(requireRole(event, wsA, 'viewer'))).toBe(200);
		await db.update(memberships).set({ role: 'editor' }).where(eq(memberships.userId, people.viewer!.id));
		try {
			const statements = await sent(() => requireRole(event, wsA, 'editor'));
			expect(statements).toHaveLength(1);
		} finally {
			await db.update(memberships).set({ role: 'viewer' }).where(eq(memberships.userId, people.viewer!.id));
		}
	});

	it('goes to PostgreSQL as a named prepared statement, as every query with parameters does', async () => {
		const statements = await sent(() => requireRole(eventFor(people.owner!), wsA, 'owner'));
		expect(statements.map((s) => s.prepare)).toEqual([true]);
		// A query built on the spot is prepared too (db/index.ts).
		const built = await sent(() => db.select().from(memberships).where(eq(memberships.workspaceId, wsB)));
		expect(built.map((s) => s.prepare)).toEqual([true]);
	});
});
