import { asc, count, eq, inArray, max, min, sum } from 'drizzle-orm';
import { db } from '../db';
import {
	auditEvents,
	billAttachments,
	bills,
	devices,
	scenarios,
	sites,
	tariffs,
	tariffVersions,
	usageIntervals,
	workspaces
} from '../db/schema';
import { listMembers } from './membership';
import { listAirPumps } from './air-pumps';

export const EXPORT_FORMAT = 'runrate-workspace-export';
export const EXPORT_VERSION = 1;

/** Groups rows by a key, so children can be hung under their parents without one query per parent. */
function groupBy<T, K>(rows: T[], key: (row: T) => K): Map<K, T[]> {
	const groups = new Map<K, T[]>();
	for (const row of rows) {
		const list = groups.get(key(row));
		if (list) list.push(row);
		else groups.set(key(row), [row]);
	}
	return groups;
}

async function exportSites(workspaceId: string) {
	const siteRows = await db
		.select()
		.from(sites)
		.where(eq(sites.workspaceId, workspaceId))
		.orderBy(asc(sites.name));
	const siteIds = siteRows.map((s) => s.id);
	if (siteIds.length === 0) return [];
	const scenarioRows = await db
		.select()
		.from(scenarios)
		.where(inArray(scenarios.siteId, siteIds))
		.orderBy(asc(scenarios.position));
	const scenarioIds = scenarioRows.map((s) => s.id);
	const deviceRows = scenarioIds.length
		? await db
				.select({
					id: devices.id,
					scenarioId: devices.scenarioId,
					position: devices.position,
					spec: devices.spec
				})
				.from(devices)
				.where(inArray(devices.scenarioId, scenarioIds))
				.orderBy(asc(devices.position))
		: [];
	const billRows = await db
		.select()
		.from(bills)
		.where(inArray(bills.siteId, siteIds))
		.orderBy(asc(bills.periodFrom));
	const billIds = billRows.map((b) => b.id);
	// The files themselves stay in storage: only what describes them goes into the export.
	const attachmentRows = billIds.length
		? await db
				.select({
					billId: billAttachments.billId,
					fileName: billAttachments.fileName,
					contentType: billAttachments.contentType,
					bytes: billAttachments.bytes,
					createdAt: billAttachments.createdAt
				})
				.from(billAttachments)
				.where(inArray(billAttachments.billId, billIds))
		: [];
	const usageRows = await db
		.select({
			siteId: usageIntervals.siteId,
			count: count(),
			first: min(usageIntervals.start),
			last: max(usageIntervals.start),
			kwh: sum(usageIntervals.kwh)
		})
		.from(usageIntervals)
		.where(inArray(usageIntervals.siteId, siteIds))
		.groupBy(usageIntervals.siteId);

	const devicesOf = groupBy(deviceRows, (d) => d.scenarioId);
	const scenariosOf = groupBy(scenarioRows, (s) => s.siteId);
	const attachmentsOf = groupBy(attachmentRows, (a) => a.billId);
	const billsOf = groupBy(billRows, (b) => b.siteId);
	const usageOf = new Map(usageRows.map((u) => [u.siteId, u]));

	return siteRows.map((site) => {
		const usage = usageOf.get(site.id);
		return {
			...site,
			scenarios: (scenariosOf.get(site.id) ?? []).map((scenario) => ({
				...scenario,
				devices: (devicesOf.get(scenario.id) ?? []).map(({ position, spec }) => ({ position, spec }))
			})),
			bills: (billsOf.get(site.id) ?? []).map((bill) => ({
				...bill,
				attachments: (attachmentsOf.get(bill.id) ?? []).map(({ billId: _billId, ...a }) => a)
			})),
			usage: {
				count: usage?.count ?? 0,
				first: usage?.first ?? null,
				last: usage?.last ?? null,
				kWh: usage?.kwh == null ? 0 : Number(usage.kwh)
			}
		};
	});
}

async function exportPrivateTariffs(workspaceId: string) {
	const tariffRows = await db
		.select()
		.from(tariffs)
		.where(eq(tariffs.workspaceId, workspaceId))
		.orderBy(asc(tariffs.name));
	const ids = tariffRows.map((t) => t.id);
	const versionRows = ids.length
		? await db
				.select()
				.from(tariffVersions)
				.where(inArray(tariffVersions.tariffId, ids))
				.orderBy(asc(tariffVersions.number))
		: [];
	const versionsOf = groupBy(versionRows, (v) => v.tariffId);
	return tariffRows.map((t) => ({ ...t, versions: versionsOf.get(t.id) ?? [] }));
}

/**
 * Everything a workspace holds, as one JSON-ready object: members (name, e-mail, role — never password
 * hashes or tokens), sites with their scenarios, equipment, bills and a usage summary, private tariffs
 * with every version, the air pumps entered from data sheets, and the audit trail.
 */
export async function exportWorkspace(workspaceId: string, now = new Date()) {
	const [workspace] = await db
		.select({ id: workspaces.id, name: workspaces.name })
		.from(workspaces)
		.where(eq(workspaces.id, workspaceId));
	if (!workspace) return null;
	// Name, e-mail and role only: the export names people, it does not carry their account ids.
	const members = (await listMembers(workspaceId)).map(({ name, email, role }) => ({ name, email, role }));
	const audit = await db
		.select()
		.from(auditEvents)
		.where(eq(auditEvents.workspaceId, workspaceId))
		.orderBy(asc(auditEvents.createdAt));
	return {
		format: EXPORT_FORMAT,
		version: EXPORT_VERSION,
		exportedAt: now.toISOString(),
		workspace,
		members,
		sites: await exportSites(workspaceId),
		privateTariffs: await exportPrivateTariffs(workspaceId),
		airPumps: await listAirPumps(workspaceId),
		auditEvents: audit
	};
}
