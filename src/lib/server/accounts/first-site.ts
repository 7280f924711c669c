import { eq } from 'drizzle-orm';
import { money, moneyPerKwh } from '$lib/text/numbers';
import type { Tx } from '../db';
import { devices, memberships, scenarios, sites, tariffs, workspaces, type DeviceSpec } from '../db/schema';
import { tariffUsableBy } from '../tariffs/usable';
import { audit, type Actor } from '../workspaces/audit';
import type { KeptEstimate } from './kept-estimate';

/** What became of a kept estimate: the site, its workspace, and how its rate was carried over. */
export type FirstSite = {
	siteId: string;
	siteName: string;
	workspaceId: string;
	/** `tariff`: the site is on the library tariff chosen; `flat`: the flat price is in the site's notes;
	 * `unavailable`: the tariff chosen is gone or not public any more, so the site has none yet. */
	rate: 'tariff' | 'flat' | 'unavailable';
};

const WORKSPACE_NAME_MAX = 80;

/** "Ana's workspace" (within the workspace name's 80 characters), or the site's name without a name. */
function workspaceName(person: string | null, siteName: string): string {
	const base = person?.trim() ? `${person.trim()}'s workspace` : siteName;
	return base.length > WORKSPACE_NAME_MAX ? `${base.slice(0, WORKSPACE_NAME_MAX - 1)}…` : base;
}

/** Device names are unique within a scenario (the trail and charts name them): "Pump", "Pump (2)". */
function uniqueNames(list: KeptEstimate['devices']): DeviceSpec[] {
	const seen = new Set<string>();
	return list.map((device) => {
		let name = device.name;
		for (let n = 2; seen.has(name.toLowerCase()); n++) name = `${device.name.slice(0, 74)} (${n})`;
		seen.add(name.toLowerCase());
		return { ...device, name } as DeviceSpec;
	});
}

/**
 * Makes a confirmed sign-up's quick estimate into its first site, inside the confirmation's transaction:
 * a workspace the person owns, the site (its name, time zone and country; the library tariff when one was
 * chosen and is still public), and the devices as the baseline's equipment ("what is installed now").
 * Each step is in the trail, as when a person makes them by hand.
 */
export async function createFirstSite(tx: Tx, person: Actor, estimate: KeptEstimate): Promise<FirstSite> {
	const [workspace] = await tx
		.insert(workspaces)
		.values({ name: workspaceName(person.name, estimate.siteName) })
		.returning({ id: workspaces.id });
	const workspaceId = workspace!.id;
	await tx.insert(memberships).values({ workspaceId, userId: person.id, role: 'owner' });

	const { rate } = estimate;
	const [tariff] =
		rate.kind === 'library' ? await tx.select().from(tariffs).where(eq(tariffs.id, rate.tariffId)) : [];
	const onTariff = tariff && tariffUsableBy(workspaceId, tariff) ? tariff : null;
	const notes =
		rate.kind === 'flat'
			? `From the quick estimate: a flat price of ${moneyPerKwh(rate.perKwh, 'USD')} per kWh` +
				(rate.perMonth ? ` and a customer charge of ${money(rate.perMonth, 'USD')} a month` : '') +
				". Choose your utility's tariff on this page to price the site on it."
			: null;
	const [site] = await tx
		.insert(sites)
		.values({
			workspaceId,
			name: estimate.siteName,
			timezone: onTariff?.timezone ?? estimate.timezone,
			country: onTariff?.country ?? estimate.country,
			region: onTariff?.region ?? null,
			currency: onTariff?.currency ?? 'USD',
			tariffId: onTariff?.id ?? null,
			notes
		})
		.returning({ id: sites.id });
	const siteId = site!.id;
	const [baseline] = await tx
		.insert(scenarios)
		.values({ siteId, name: 'What is installed now', isBaseline: true, status: 'installed' })
		.returning({ id: scenarios.id });
	const specs = uniqueNames(estimate.devices);
	await tx
		.insert(devices)
		.values(specs.map((spec, position) => ({ scenarioId: baseline!.id, position, spec })));

	const trail = { workspaceId, siteId };
	await audit(tx, person, {
		...trail,
		entity: 'site',
		entityId: siteId,
		action: 'created',
		summary: `Created site ${estimate.siteName} from the quick estimate`
	});
	await audit(tx, person, {
		...trail,
		entity: 'scenario',
		entityId: baseline!.id,
		action: 'created',
		summary: 'Created the baseline scenario'
	});
	await audit(tx, person, {
		...trail,
		entity: 'device',
		entityId: baseline!.id,
		action: 'saved',
		summary: `Equipment of "What is installed now": added ${specs.map((d) => d.name).join(', ')}`
	});
	return {
		siteId,
		siteName: estimate.siteName,
		workspaceId,
		rate: rate.kind === 'flat' ? 'flat' : onTariff ? 'tariff' : 'unavailable'
	};
}
