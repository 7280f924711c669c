import type { RequestEvent } from '@sveltejs/kit';
import {
	compareRequestSchema,
	parseRequest,
	redundancy,
	versionInForce,
	type AirDesign,
	type CompareRequest,
	type SiteWater,
	type Tariff
} from '$lib/calc';
import { needsElectricalCaution } from '$lib/cautions';
import type { ComparedScenario, ComparisonQuery, ComparisonReport } from '$lib/compare/types';
import { siteWorkspace } from '$lib/server/sites/site.service';
import type { DeviceSpec } from '$lib/server/db/schema';
import { requireScenarioAccess } from '$lib/server/guard';
import { equipmentOf, tariffFor } from '$lib/server/sites/results.service';
import { TARIFF_UNAVAILABLE, usableTariff } from '$lib/server/tariffs/usable';
import { listDevices } from '$lib/server/sites/equipment.service';
import { deliveryOf, storedDesign, storedWater } from '$lib/server/sites/delivery';
import type { ScenarioRow } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { assumptionsOf } from './assumptions';
import { comparisonPlace } from './issue-place';
import { equipmentList } from './equipment-list';
import { storedCompare } from './stored-comparison';

/** Everything a comparison of stored scenarios is made of: the report, and the exact request given to compare(). */
export interface Comparison {
	report: ComparisonReport;
	request: CompareRequest;
	specs: DeviceSpec[][];
	/** Each scenario's stored air design and its site's water, for the workbook's "Water and air" sheet. */
	stored: { airDesign: AirDesign | null; water: SiteWater }[];
}

export type Built = { ok: true; comparison: Comparison } | { ok: false; message: string; path: string };

interface Loaded {
	site: SiteRow;
	scenario: ScenarioRow;
	specs: DeviceSpec[];
	tariff: Tariff;
	tariffName: string;
	tariffVersion: number;
	holidays: unknown;
	source: string;
	checkedOn: string;
	utility: string;
	effectiveFrom: string;
	effectiveTo: string | null;
	urdbLabel: string | null;
	workspaceName: string;
}

async function load(event: RequestEvent, id: string, firstDay: string): Promise<Loaded | string> {
	// Unreadable, deleted or unknown scenarios are all "not found" (404), as everywhere else.
	const { site, scenario, viaGrant } = await requireScenarioAccess(event, id, 'viewer');
	const resolved = await tariffFor(site, scenario);
	if (!resolved.ok)
		return resolved.reason === 'unavailable'
			? `“${scenario.name}” (${site.name}): ${TARIFF_UNAVAILABLE}; pick another tariff for it first`
			: `“${scenario.name}” (${site.name}) has no tariff: pick one for the site first`;
	const version = versionInForce(resolved.versions, firstDay);
	if (!version) {
		return `No version of ${resolved.tariff.name} is in force on ${firstDay}, the first day compared: choose another first month`;
	}
	const specs = (await listDevices(scenario.id)).map((d) => d.spec);
	const stored = (await usableTariff(site.workspaceId, resolved.tariff.id))?.versions.find(
		(v) => v.id === version.id
	);
	return {
		// A guest of one site sees the site, not the workspace around it (as the site pages do).
		workspaceName: viaGrant ? '' : ((await siteWorkspace(site))?.name ?? ''),
		source: stored?.source ?? '',
		checkedOn: stored?.checkedOn ?? '',
		// The stored row's dates: a pinned version is priced as if always in force, but was not.
		effectiveFrom: stored?.effectiveFrom ?? version.effectiveFrom,
		effectiveTo: stored ? stored.effectiveTo : version.effectiveTo,
		utility: resolved.tariff.utility,
		urdbLabel: resolved.tariff.urdbLabel,
		site,
		scenario,
		specs,
		tariff: version.tariff,
		tariffName: `${resolved.tariff.utility} — ${resolved.tariff.name}`,
		tariffVersion: version.number,
		holidays: resolved.tariff.holidays ?? {
			country: site.country,
			...(site.region ? { region: site.region } : {})
		}
	};
}

/** Per device category, the year's kWh, from the periods' device shares (devices in request order). */
function kwhByCategory(
	specs: DeviceSpec[],
	periods: ComparisonReport['result']['scenarios'][number]['periods']
) {
	const totals: Record<string, number> = {};
	specs.forEach((spec, i) => {
		const category = spec.category ?? 'other';
		totals[category] =
			(totals[category] ?? 0) + periods.reduce((sum, p) => sum + (p.equipment[i]?.kwh ?? 0), 0);
	});
	return totals;
}

/**
 * Compares stored scenarios the caller may read, over the 12 months from `query.start`, each on the
 * tariff version in force on the first day compared. Times and holidays follow the baseline's site.
 */
export async function buildComparison(event: RequestEvent, query: ComparisonQuery): Promise<Built> {
	const firstDay = `${query.start}-01`;
	const loaded: Loaded[] = [];
	for (const id of query.scenarios) {
		const one = await load(event, id, firstDay);
		if (typeof one === 'string') return { ok: false, message: one, path: 'scenarios' };
		loaded.push(one);
	}
	const baseline = query.scenarios.indexOf(query.baseline);
	const base = loaded[baseline]!;
	const currencies = new Set(loaded.map((l) => l.tariff.currency));
	if (currencies.size > 1) {
		return {
			ok: false,
			path: 'scenarios',
			message: `These scenarios are priced in different currencies (${[...currencies].join(', ')}); compare scenarios in one currency`
		};
	}
	const names = loaded.map((l) => l.scenario.name);
	const label = (l: Loaded, i: number) =>
		names.indexOf(l.scenario.name) === i && names.lastIndexOf(l.scenario.name) === i
			? l.scenario.name
			: `${l.scenario.name} (${l.site.name})`;
	const parsed = parseRequest(compareRequestSchema, {
		period: { start: query.start, months: 12 },
		timezone: base.site.timezone,
		holidays: base.holidays,
		tariff: base.tariff,
		scenarios: loaded.map((l, i) => ({
			name: label(l, i),
			status: l.scenario.status,
			equipment: l.specs.map(equipmentOf),
			oneOffCosts: l.scenario.oneOffCosts,
			tariff: l.tariff
		})),
		baseline,
		finance: {
			horizonYears: query.horizonYears,
			discountPercent: query.discountPercent,
			escalationPercent: query.escalationPercent
		},
		emissionFactorKgPerKwh: query.emissionKgPerKwh
	});
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		return {
			ok: false,
			path: 'scenarios',
			message: issue
				? `${comparisonPlace(
						issue.path,
						loaded.map((l, i) => ({ name: label(l, i), devices: l.specs }))
					)}: ${issue.message}`
				: 'These scenarios cannot be compared'
		};
	}
	const result = await storedCompare(parsed.data, base.scenario.id, query.scenarios);
	const scenarios: ComparedScenario[] = loaded.map((l, i) => ({
		id: l.scenario.id,
		name: label(l, i),
		status: l.scenario.status,
		description: l.scenario.description ?? '',
		oneOffCosts: l.scenario.oneOffCosts,
		equipment: equipmentList(parsed.data.scenarios[i]?.equipment ?? [], result.scenarios[i]?.periods ?? []),
		workspaceName: l.workspaceName,
		siteId: l.site.id,
		siteName: l.site.name,
		tariffName: l.tariffName,
		tariffVersion: l.tariffVersion,
		tariffSource: l.source,
		tariffCheckedOn: l.checkedOn,
		tariffUtility: l.utility,
		tariffEffectiveFrom: l.effectiveFrom,
		tariffEffectiveTo: l.effectiveTo,
		tariffUrdbLabel: l.urdbLabel,
		deviceCount: l.specs.length,
		kwhByCategory: kwhByCategory(l.specs, result.scenarios[i]?.periods ?? []),
		redundancy: redundancy(parsed.data.scenarios[i]?.equipment ?? []),
		caution: needsElectricalCaution(l.specs),
		// From the rows already read through the guard above: no further query.
		delivery: deliveryOf(l.specs, l.scenario.airDesign, l.site.water)
	}));
	const report: ComparisonReport = {
		query,
		currency: base.tariff.currency,
		timezone: base.site.timezone,
		baseline,
		scenarios,
		result,
		assumptions: assumptionsOf(
			query,
			scenarios,
			loaded.map((l) => l.site.timezone),
			base.site.timezone,
			result.scenarios.map((s) => s.status)
		)
	};
	const stored = loaded.map((l) => ({
		airDesign: storedDesign(l.scenario.airDesign),
		water: storedWater(l.site.water)
	}));
	return {
		ok: true,
		comparison: { report, request: parsed.data, specs: loaded.map((l) => l.specs), stored }
	};
}
