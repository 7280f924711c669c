import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asc, eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import {
	auditEvents,
	devices,
	memberships,
	scenarios,
	sites,
	userTokens,
	users
} from '$lib/server/db/schema';
import { stopJobs } from '$lib/server/jobs';
import { confirmSignUp, pendingSignUpWith, resendConfirmation, signUp } from '$lib/server/accounts/sign-up';
import { keptEstimateSchema, type KeptEstimate } from '$lib/server/accounts/kept-estimate';
import { sitesHomeFor } from '$lib/server/accounts/landing';
import { createTariff } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeUser, tariffMeta, versionMeta } from './fixtures';

// Issue 17: the home page's quick estimate travels with a sign-up, waits through the e-mail confirmation
// and becomes the new account's first site. Invented people, sites and tariffs.
const tag = `kept-${Date.now()}`;
const ORIGIN = 'http://127.0.0.1';
const PASSWORD = 'a long grower password';

afterAll(async () => {
	await stopJobs();
	await client.end({ timeout: 5 });
});

/** The newest confirmation token mailed to `to`, waiting for the queue to deliver it. */
async function confirmationToken(to: string, after = 0): Promise<string> {
	const until = Date.now() + 15_000;
	for (;;) {
		const mails = (await (
			await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(to)}`)
		).json()) as { id: number; text: string }[];
		const token = mails
			.filter((m) => m.id > after)
			.map((m) => /\/signup\/confirm\?token=([\w-]+)/.exec(m.text)?.[1])
			.filter(Boolean)
			.at(-1);
		if (token) return token;
		if (Date.now() > until) throw new Error(`no confirmation mail to ${to}`);
		await new Promise((resolve) => setTimeout(resolve, 200));
	}
}

const lastMailId = async () =>
	((await (await fetch(`${process.env.MAIL_VIEW_URL}/messages`)).json()) as { id: number }[]).at(-1)?.id ?? 0;

const pump = (name: string, amps = 1.5) => ({
	name,
	category: 'other' as const,
	quantity: 1,
	power: { amps, volts: 120, powerFactor: 1, phases: 1 as const },
	schedule: { type: 'always' as const }
});

const estimate = (more: Partial<KeptEstimate> = {}): KeptEstimate =>
	keptEstimateSchema.parse({
		siteName: 'Hillside tanks (invented)',
		country: 'US',
		timezone: 'America/Denver',
		devices: [pump('Water pump'), pump('Water pump', 0.5)],
		rate: { kind: 'flat', perKwh: 0.15, perMonth: 10 },
		...more
	});

/** Signs up with the estimate, confirms from the mailed link, and returns the confirmation's answer. */
async function signUpAndConfirm(email: string, kept: KeptEstimate) {
	const after = await lastMailId();
	await signUp({ name: 'Ana Grower', email, password: PASSWORD }, ORIGIN, kept);
	return confirmSignUp(await confirmationToken(email, after), PASSWORD);
}

let publicTariff = '';
let privateTariff = '';
beforeAll(async () => {
	const curator = await makeUser(`curator-${tag}@example.org`, 'Curator (invented)');
	const meta = { timezone: 'America/Los_Angeles', country: 'US', region: 'CA' };
	publicTariff = await createTariff(
		{
			meta: tariffMeta(`Kept Utility ${tag}`, 'Open flat rate', meta),
			version: versionMeta('2026-01-01'),
			structure: flat(0.2),
			workspaceId: null
		},
		curator
	);
	privateTariff = await createTariff(
		{
			meta: tariffMeta(`Kept Utility ${tag}`, 'Someone else’s rate'),
			version: versionMeta('2026-01-01'),
			structure: flat(0.3),
			workspaceId: await createWorkspace(`Other ${tag}`, curator.id)
		},
		curator
	);
});

describe('a sign-up that carries the quick estimate', () => {
	it('keeps the estimate on the pending sign-up and nothing on the unconfirmed account', async () => {
		const email = `pending-${tag}@example.org`;
		await signUp({ name: 'Ana Grower', email, password: PASSWORD }, ORIGIN, estimate());
		const [user] = await db.select().from(users).where(eq(users.email, email));
		const [row] = await db.select().from(userTokens).where(eq(userTokens.userId, user!.id));
		expect(row!.estimate).toMatchObject({
			siteName: 'Hillside tanks (invented)',
			timezone: 'America/Denver'
		});
		expect(await db.select().from(memberships).where(eq(memberships.userId, user!.id))).toEqual([]);
	});

	it('becomes the first site on confirmation: workspace, site, time zone and the devices as the baseline', async () => {
		const email = `first-site-${tag}@example.org`;
		const result = await signUpAndConfirm(email, estimate());
		if (typeof result === 'string') throw new Error(`not confirmed: ${result}`);
		const first = result.firstSite!;
		expect(first).toMatchObject({ siteName: 'Hillside tanks (invented)', rate: 'flat' });

		const [site] = await db.select().from(sites).where(eq(sites.id, first.siteId));
		expect(site).toMatchObject({
			timezone: 'America/Denver',
			country: 'US',
			currency: 'USD',
			tariffId: null
		});
		expect(site!.notes).toContain('$0.15 per kWh');
		expect(site!.notes).toContain('$10.00 a month');

		const [baseline] = await db.select().from(scenarios).where(eq(scenarios.siteId, first.siteId));
		expect(baseline).toMatchObject({ isBaseline: true, status: 'installed' });
		const list = await db
			.select()
			.from(devices)
			.where(eq(devices.scenarioId, baseline!.id))
			.orderBy(asc(devices.position));
		// Names are unique within a scenario: the second pump of the same name is numbered.
		expect(list.map((d) => d.spec.name)).toEqual(['Water pump', 'Water pump (2)']);
		expect(list[1]!.spec.power).toMatchObject({ amps: 0.5, volts: 120 });

		const [user] = await db.select().from(users).where(eq(users.email, email));
		const [member] = await db.select().from(memberships).where(eq(memberships.userId, user!.id));
		expect(member).toMatchObject({ workspaceId: first.workspaceId, role: 'owner' });
		expect(await sitesHomeFor(user!.id)).toBe(`/w/${first.workspaceId}/sites`);
		const trail = await db.select().from(auditEvents).where(eq(auditEvents.siteId, first.siteId));
		expect(trail.map((e) => e.summary)).toContain(
			'Created site Hillside tanks (invented) from the quick estimate'
		);
	});

	it('puts the site on the public library tariff chosen, in that tariff’s time zone and currency', async () => {
		const result = await signUpAndConfirm(
			`on-tariff-${tag}@example.org`,
			estimate({ rate: { kind: 'library', tariffId: publicTariff } })
		);
		if (typeof result === 'string') throw new Error(`not confirmed: ${result}`);
		expect(result.firstSite!.rate).toBe('tariff');
		const [site] = await db.select().from(sites).where(eq(sites.id, result.firstSite!.siteId));
		expect(site).toMatchObject({ tariffId: publicTariff, timezone: 'America/Los_Angeles', region: 'CA' });
	});

	it('leaves out a tariff the new workspace may not use (another workspace’s private one)', async () => {
		const result = await signUpAndConfirm(
			`private-tariff-${tag}@example.org`,
			estimate({ rate: { kind: 'library', tariffId: privateTariff } })
		);
		if (typeof result === 'string') throw new Error(`not confirmed: ${result}`);
		expect(result.firstSite!.rate).toBe('unavailable');
		const [site] = await db.select().from(sites).where(eq(sites.id, result.firstSite!.siteId));
		expect(site!.tariffId).toBeNull();
	});

	it('survives a fresh confirmation link, and a wrong password makes no site', async () => {
		const email = `resent-${tag}@example.org`;
		await signUp({ name: 'Ana Grower', email, password: PASSWORD }, ORIGIN, estimate());
		const first = await confirmationToken(email);
		expect(await confirmSignUp(first, 'not the password at all')).toBe('wrong-password');
		const after = await lastMailId();
		await resendConfirmation((await pendingSignUpWith(email, PASSWORD))!, ORIGIN);
		const result = await confirmSignUp(await confirmationToken(email, after), PASSWORD);
		if (typeof result === 'string') throw new Error(`not confirmed: ${result}`);
		expect(result.firstSite?.siteName).toBe('Hillside tanks (invented)');
		const [user] = await db.select().from(users).where(eq(users.email, email));
		expect(await db.select().from(memberships).where(eq(memberships.userId, user!.id))).toHaveLength(1);
	});

	it('confirms a sign-up without an estimate with no workspace, as before', async () => {
		const email = `plain-${tag}@example.org`;
		const after = await lastMailId();
		await signUp({ name: 'Plain Grower', email, password: PASSWORD }, ORIGIN);
		const result = await confirmSignUp(await confirmationToken(email, after), PASSWORD);
		expect(result).toEqual({ email });
	});
});

describe('what an estimate may hold', () => {
	const refused = (more: Record<string, unknown>) =>
		keptEstimateSchema.safeParse({ ...estimate(), ...more }).error?.issues.map((i) => i.message);

	it('refuses a ninth device, an unknown country and a zone that is not one', () => {
		expect(refused({ devices: Array.from({ length: 9 }, (_, i) => pump(`Pump ${i}`)) })).toBeDefined();
		expect(refused({ country: 'ZZ' })).toEqual([
			'No public-holiday calendar for this country: check the two letters (US, CA, DE…)'
		]);
		expect(refused({ timezone: 'Mars/Olympus' })).toBeDefined();
	});

	it('refuses a device the core cannot price', () => {
		expect(refused({ devices: [{ ...pump('Pump'), power: { amps: -1, volts: 120 } }] })).toContain(
			'Amps must be zero or more'
		);
	});
});
