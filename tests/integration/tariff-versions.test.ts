import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { calculateAcrossVersions, calculateRequestSchema, tariffSchema } from '$lib/calc';
import { client, db } from '$lib/server/db';
import { tariffVersions } from '$lib/server/db/schema';
import {
	copyTariff,
	createTariff,
	findTariff,
	publishVersion,
	searchTariffs,
	TariffConflict
} from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeUser, tariffMeta, versionMeta } from './fixtures';

// Against the real PostgreSQL of `npm test`; every tariff here is invented.
const tag = `tv-${Date.now()}`;
let author: { id: string; name: string | null; email: string };
let wsA = '';
let wsB = '';

const meta = tariffMeta(`Invented Utility ${tag}`, 'Flat test rate', { region: 'TX' });

beforeAll(async () => {
	author = await makeUser(`curator-${tag}@example.org`, 'Curator');
	wsA = await createWorkspace(`A ${tag}`, author.id);
	wsB = await createWorkspace(`B ${tag}`, author.id);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('which version applies', () => {
	it('prices each billing period on the stored version in force on its first day', async () => {
		const id = await createTariff(
			{ meta, version: versionMeta('2026-01-01'), structure: flat(0.1), workspaceId: wsA },
			author
		);
		await publishVersion(id, 1, { meta, version: versionMeta('2027-04-01'), structure: flat(0.3) }, author);
		const found = await findTariff(id);
		expect(found!.versions.map((v) => [v.number, v.effectiveFrom])).toEqual([
			[1, '2026-01-01'],
			[2, '2027-04-01']
		]);

		const request = calculateRequestSchema.parse({
			period: { start: '2027-03', months: 2 },
			timezone: 'America/Chicago',
			holidays: null,
			tariff: flat(0),
			equipment: [
				{ name: 'Load', category: 'other', quantity: 1, power: { watts: 1000 }, schedule: { type: 'always' } }
			]
		});
		const result = calculateAcrossVersions(
			request,
			found!.versions.map((v) => ({ ...v, tariff: tariffSchema.parse(v.structure) }))
		);
		// March 2027 in Chicago has 743 hours (spring forward, luxon agrees); April 720.
		expect(result.periods.map((p) => p.total)).toEqual([74.3, 216]);
		expect(result.versions.map((v) => v.number)).toEqual([1, 2]);
	});
});

describe('publishing', () => {
	it('never changes a published version and refuses a stale editor with a conflict', async () => {
		const id = await createTariff(
			{ meta, version: versionMeta('2026-01-01'), structure: flat(0.1), workspaceId: wsA },
			author
		);
		const [first] = await db.select().from(tariffVersions).where(eq(tariffVersions.tariffId, id));

		// Two people opened the editor at revision 1; the first to save wins.
		await publishVersion(id, 1, { meta, version: versionMeta('2027-01-01'), structure: flat(0.2) }, author);
		await expect(
			publishVersion(id, 1, { meta, version: versionMeta('2027-01-01'), structure: flat(0.25) }, author)
		).rejects.toBeInstanceOf(TariffConflict);

		const found = await findTariff(id);
		expect(found!.versions).toHaveLength(2);
		expect(found!.tariff.revision).toBe(2);
		expect(found!.versions[0]).toEqual(first);
		expect(found!.versions[1]!.structure).toEqual(flat(0.2));
	});
});

describe('visibility', () => {
	it("keeps a workspace's private tariff out of another workspace's search, and copies a public one", async () => {
		const privateId = await createTariff(
			{
				meta: { ...meta, name: `Private ${tag}` },
				version: versionMeta('2026-01-01'),
				structure: flat(0.1),
				workspaceId: wsA
			},
			author
		);
		const publicId = await createTariff(
			{
				meta: { ...meta, name: `Public ${tag}` },
				version: versionMeta('2026-01-01'),
				structure: flat(0.1),
				workspaceId: null
			},
			author
		);

		const fromB = await searchTariffs([wsB], { q: tag });
		expect(fromB.items.map((i) => i.tariff.id)).toContain(publicId);
		expect(fromB.items.map((i) => i.tariff.id)).not.toContain(privateId);
		const fromA = await searchTariffs([wsA], { q: tag });
		expect(fromA.items.map((i) => i.tariff.id)).toEqual(expect.arrayContaining([publicId, privateId]));

		const copyId = await copyTariff(publicId, wsB, author);
		const copy = await findTariff(copyId);
		expect(copy!.tariff).toMatchObject({ workspaceId: wsB, copiedFromId: publicId });
		expect(copy!.versions[0]!.structure).toEqual(flat(0.1));
	});

	it('filters by structure', async () => {
		const touId = await createTariff(
			{
				meta: { ...meta, name: `TOU ${tag}` },
				version: versionMeta('2026-01-01'),
				structure: {
					currency: 'USD',
					energyCharges: [
						{
							label: 'Supply',
							type: 'tou',
							seasons: [
								{
									months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
									periods: [
										{
											label: 'On-peak',
											perKwh: 0.3,
											days: 'weekdays',
											windows: [{ start: '16:00', end: '21:00' }]
										}
									],
									otherPerKwh: 0.1
								}
							]
						}
					]
				},
				workspaceId: null
			},
			author
		);
		const tou = await searchTariffs([], { q: tag, feature: 'tou' });
		expect(tou.items.map((i) => i.tariff.id)).toEqual([touId]);
	});
});
