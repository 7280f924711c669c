import { requireRole } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { listScenarios } from '$lib/server/sites/scenario.service';
import { listSites } from '$lib/server/sites/site.service';
import { priceScenario } from '$lib/server/sites/results.service';
import { recentNotices } from '$lib/server/tariffs/tariff-notice.service';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	const now = new Date();
	const year = now.getUTCFullYear();
	const monthIndex = now.getUTCMonth();
	const sites = await listSites(workspace.id);
	const rows = await Promise.all(
		sites.map(async (site) => {
			const baseline =
				(await listScenarios(site.id)).find((s) => s.isBaseline && !s.deletedAt && !s.archivedAt) ?? null;
			const devices = baseline ? await listDevices(baseline.id) : [];
			const priced = baseline
				? await priceScenario(
						site,
						baseline,
						devices.map((d) => d.spec),
						{ start: `${year}-01`, months: 12 }
					)
				: null;
			const months = priced?.ok
				? priced.result.periods.map((p) => ({ label: p.label, cost: p.total, kwh: p.kwh }))
				: [];
			return {
				id: site.id,
				name: site.name,
				address: site.address,
				currency: site.currency,
				baselineName: baseline?.name ?? null,
				deviceCount: devices.length,
				thisMonth: months[monthIndex] ?? null,
				year: months,
				problem: priced && !priced.ok ? priced.message : baseline ? null : 'No baseline scenario',
				note: priced?.ok ? priced.note : null
			};
		})
	);
	// The latest tariff change notices show here too, where the costs they change are.
	return { sites: rows, canEdit: role !== 'viewer', year, notices: await recentNotices(workspace.id, 3) };
}) satisfies PageServerLoad;
