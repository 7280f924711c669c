// Set-up shared by the integration tests: invented people, sites and tariffs, stored through the app's own
// services. Nothing here may import workspaces/invitation.ts: it loads mail.ts, whose transport
// mail-retry.test.ts must point at its own mail server first.
import type { TariffInput } from '$lib/calc';
import type { SiteInput } from '$lib/forms/site.schema';
import type { TariffMeta, VersionMeta } from '$lib/forms/tariff-meta.schema';
import { db } from '$lib/server/db';
import { users, type HolidayRule } from '$lib/server/db/schema';
import type { Actor } from '$lib/server/workspaces/audit';
import { createSite, findSite, type SiteRow } from '$lib/server/sites/site.service';

/** Stores a user with that email and name; `more` fills other columns (a password hash, a verified date). */
export async function makeUser(
	email: string,
	name: string,
	more: Partial<typeof users.$inferInsert> = {}
): Promise<SessionUser> {
	const [user] = await db
		.insert(users)
		.values({ ...more, email, name })
		.returning({ id: users.id, email: users.email, name: users.name, isAdmin: users.isAdmin });
	return user!;
}

/** A site in Chicago billed in US dollars with every optional field empty, unless `overrides` sets it. */
export const siteInput = (name: string, overrides: Partial<SiteInput> = {}): SiteInput => ({
	name,
	address: null,
	timezone: 'America/Chicago',
	country: 'US',
	region: null,
	supplyVolts: null,
	supplyPhases: null,
	tariffId: null,
	tariffVersion: null,
	currency: 'USD',
	notes: null,
	...overrides
});

/** Creates a site as `siteInput` describes it, with its baseline scenario, and reads back the stored row. */
export async function makeSite(
	workspaceId: string,
	actor: Actor,
	name: string,
	overrides: Partial<SiteInput> = {}
): Promise<SiteRow> {
	const id = await createSite(workspaceId, siteInput(name, overrides), actor);
	return (await findSite(id))!;
}

type NewTariffMeta = TariffMeta & { holidays: HolidayRule };

/** An invented agricultural tariff's details in Chicago time and US dollars; `overrides` sets the rest. */
export const tariffMeta = (
	utility: string,
	name: string,
	overrides: Partial<NewTariffMeta> = {}
): NewTariffMeta => ({
	utility,
	name,
	code: null,
	country: 'US',
	region: null,
	area: null,
	customerClass: 'agricultural',
	currency: 'USD',
	timezone: 'America/Chicago',
	holidays: null,
	description: null,
	...overrides
});

/** A tariff version in force from `effectiveFrom` with no end, its source an invented one. */
export const versionMeta = (effectiveFrom: string, changeNote = ''): VersionMeta => ({
	effectiveFrom,
	effectiveTo: null,
	source: 'Invented for a test',
	checkedOn: '2026-11-01',
	changeNote
});

/** A tariff of one flat energy charge, `perKwh` US dollars a kWh. */
export const flat = (perKwh: number): TariffInput => ({
	currency: 'USD',
	energyCharges: [{ label: 'Energy', type: 'flat', perKwh }]
});

/** `peak` US dollars a kWh on weekday afternoons (14:00–20:00), 8 cents at all other hours. */
export const weekdayPeak = (peak: number): TariffInput => ({
	currency: 'USD',
	energyCharges: [
		{
			label: 'Energy',
			type: 'tou',
			seasons: [
				{
					months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
					otherPerKwh: 0.08,
					periods: [
						{ label: 'on-peak', perKwh: peak, days: 'weekdays', windows: [{ start: '14:00', end: '20:00' }] }
					]
				}
			]
		}
	]
});
