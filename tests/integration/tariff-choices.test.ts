import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, like } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { tariffs } from '$lib/server/db/schema';
import { createTariff } from '$lib/server/tariffs/tariff.service';
import { chooserFor, tariffChoiceProblem } from '$lib/server/tariffs/usable';
import { allChoices, PUBLIC_CHOICES, tariffChoices } from '$lib/server/tariffs/tariff-choices';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// The site form's tariff list after a curator's bulk import: every tariff the site may use stays reachable.
// Every utility, tariff and label here is invented.
const tag = `choices-${Date.now()}`;
const PUBLIC_COUNT = 120;
const LABEL = `${tag}-label-0007`;
let owner: SessionUser;
let workspace = '';
const own: string[] = [];
let hidden = '';
let firstPublic = '';
let lastPublic = '';

const tariff = (utility: string, name: string, workspaceId: string | null) =>
	createTariff(
		{
			meta: tariffMeta(utility, name),
			version: versionMeta('2026-01-01'),
			structure: flat(0.1),
			workspaceId
		},
		owner
	);

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Choices owner');
	workspace = await createWorkspace(`Choices ${tag}`, owner.id);
	// The workspace's own tariffs sort after every public one, so a list cut at 100 by utility would miss them.
	for (const name of ['Barn meter', 'Greenhouse meter', 'Pond meter'])
		own.push(await tariff(`Zz ${tag} own utility`, name, workspace));
	hidden = await tariff(`Zz ${tag} own utility`, 'Office meter', workspace);
	const ids: string[] = [];
	for (let i = 0; i < PUBLIC_COUNT; i++)
		ids.push(await tariff(`Aa ${tag} Utility ${String(i).padStart(3, '0')}`, `Rate ${i}`, null));
	firstPublic = ids[0]!;
	lastPublic = ids.at(-1)!;
	await db.update(tariffs).set({ urdbLabel: LABEL }).where(eq(tariffs.id, ids[7]!));
}, 120_000);

// The 120 public tariffs would otherwise sort first in every public list the later suites read (the e2e
// run shares this database): they go once the tests here are done.
afterAll(async () => {
	await db.delete(tariffs).where(like(tariffs.utility, `Aa ${tag}%`));
});

describe('a member of the workspace', () => {
	it('is offered every own tariff, grouped first, even with more than 100 public ones', async () => {
		const choices = await tariffChoices({ workspaceId: workspace });
		const ownIds = choices.own.choices.map((c) => c.id);
		for (const id of [...own, hidden]) expect(ownIds).toContain(id);
		expect(choices.own.label).toBe("Our workspace's tariffs");
		expect(choices.own.choices.every((c) => c.label.endsWith(' (ours)'))).toBe(true);
		expect(choices.public.choices.length).toBeLessThanOrEqual(PUBLIC_CHOICES);
	});

	it('finds public tariffs by utility, 50 at most, and says how many match', async () => {
		const choices = await tariffChoices({ workspaceId: workspace }, { search: `Aa ${tag}` });
		expect(choices.found).toBe(PUBLIC_COUNT);
		expect(choices.public.choices).toHaveLength(PUBLIC_CHOICES);
		expect(choices.public.choices.map((c) => c.id)).toContain(firstPublic);
		expect(choices.public.choices.map((c) => c.id)).not.toContain(lastPublic);
		// The own group does not depend on the search.
		expect(choices.own.choices.map((c) => c.id)).toEqual(expect.arrayContaining(own));
	});

	it('finds a public tariff by its open-data label, and the last one by its utility', async () => {
		const byLabel = await tariffChoices({ workspaceId: workspace }, { search: LABEL });
		expect(byLabel.found).toBe(1);
		expect(byLabel.public.choices.map((c) => c.label)).toEqual([`Aa ${tag} Utility 007 — Rate 7`]);
		const last = await tariffChoices({ workspaceId: workspace }, { search: `${tag} Utility 119` });
		expect(last.public.choices.map((c) => c.id)).toEqual([lastPublic]);
		expect(last.public.choices[0]!.versions).toEqual([{ number: 1, effectiveFrom: '2026-01-01' }]);
	});

	it('keeps the tariff chosen now offered when a search leaves it out', async () => {
		const choices = await tariffChoices(
			{ workspaceId: workspace },
			{ search: `${tag} Utility 000`, current: [lastPublic] }
		);
		expect(choices.public.choices.map((c) => c.id)).toEqual([lastPublic, firstPublic]);
	});
});

describe('a guest of one site', () => {
	it("sees public tariffs and the site's own only, never the workspace's other private ones", async () => {
		const site = await makeSite(workspace, owner, `Shared ${tag}`, { tariffId: own[0]! });
		const guest = chooserFor({ site, viaGrant: true });
		for (const search of ['', `Zz ${tag}`, 'Office meter']) {
			const choices = await tariffChoices(guest, { search, current: [site.tariffId] });
			const ids = allChoices(choices).map((c) => c.id);
			expect(ids).toContain(own[0]);
			for (const other of [...own.slice(1), hidden]) expect(ids).not.toContain(other);
			expect(choices.own.label).toBe("This site's tariffs");
		}
		// The list is a convenience: the save checks the choice again.
		expect(await tariffChoiceProblem(guest, { tariffId: hidden, tariffVersion: null })).not.toBeNull();
	});

	it('is bounded too: a search answers 50 public tariffs at most', async () => {
		const site = await makeSite(workspace, owner, `Shared again ${tag}`, { tariffId: own[0]! });
		const choices = await tariffChoices(chooserFor({ site, viaGrant: true }), { search: tag });
		expect(choices.public.choices.length).toBeLessThanOrEqual(PUBLIC_CHOICES);
	});
});
