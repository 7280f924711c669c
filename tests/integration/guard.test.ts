import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { client, db } from '$lib/server/db';
import { memberships } from '$lib/server/db/schema';
import { requireRole, type Role } from '$lib/server/guard';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { makeUser } from './fixtures';

const tag = `guard-${Date.now()}`;
const people: Record<string, SessionUser> = {};
let wsA = '';
let wsB = '';

function eventFor(user: SessionUser | null, path = '/w/x'): RequestEvent {
	return {
		locals: { user },
		url: new URL(`http://127.0.0.1${path}`),
		request: new Request(`http://127.0.0.1${path}`)
	} as unknown as RequestEvent;
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
