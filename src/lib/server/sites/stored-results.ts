// A stored scenario's priced result, kept in PostgreSQL (`priced_result`) under the key of everything it
// depends on (stored-key.ts) and priced again only when that key changes. Only a stored scenario's own
// devices are priced through here: an edited list not yet saved goes to priceScenario directly.
import { and, eq, inArray } from 'drizzle-orm';
import { needsElectricalCaution } from '$lib/cautions';
import { db } from '../db';
import { devices, pricedResults, type DeviceSpec } from '../db/schema';
import { logger } from '../log';
import { usableTariff, usableTariffs } from '../tariffs/usable';
import { priceScenario, type Priced, type UsableTariff } from './results.service';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import { currentRulesVersion, dependsOn, hashOf, slotOf, type PricedPeriod } from './stored-key';

type PricedOk = Extract<Priced, { ok: true }>;

/** What lists (the dashboard, the site page) read of a stored result, without the whole result. */
export interface PricedSummary {
	periods: { label: string; cost: number; kwh: number }[];
	totals: { cost: number; kwh: number };
	note: string | null;
	deviceCount: number;
	caution: boolean;
}

/** A list's answer for one scenario: its summary, or why it cannot be priced (with its devices' count). */
export type SummaryOrProblem =
	| { ok: true; summary: PricedSummary }
	| { ok: false; message: string; deviceCount: number; caution: boolean };

const summaryOf = ({ result, note }: PricedOk, specs: DeviceSpec[]): PricedSummary => ({
	periods: result.periods.map((p) => ({ label: p.label, cost: p.total, kwh: p.kwh })),
	totals: { cost: result.totals.cost, kwh: result.totals.kwh },
	note,
	deviceCount: specs.length,
	caution: needsElectricalCaution(specs)
});

/** The tariff id a scenario is priced on: its own override, else the site's. */
const tariffIdOf = (site: SiteRow, scenario: ScenarioRow) => scenario.tariffId ?? site.tariffId;

/** The key and its words for a scenario on a loaded tariff; null when there is nothing to key (no tariff). */
function keyOf(
	site: SiteRow,
	scenario: ScenarioRow,
	tariff: UsableTariff,
	period: PricedPeriod,
	pinVersion?: number
) {
	if (!tariff) return null;
	const words = dependsOn({ site, scenario, tariff, period, pinVersion });
	return { words, key: hashOf(words) };
}

/** Stores an `ok` result in its slot, replacing what the slot held; a failed write only costs a recompute. */
async function store(
	scenarioId: string,
	slot: string,
	keyed: NonNullable<ReturnType<typeof keyOf>>,
	priced: PricedOk,
	summary: PricedSummary
) {
	const { ok: _ok, ...result } = priced;
	const row = {
		inputKey: keyed.key,
		rulesVersion: currentRulesVersion(),
		dependsOn: keyed.words,
		result,
		summary,
		computedAt: new Date()
	};
	try {
		await db
			.insert(pricedResults)
			.values({ scenarioId, slot, ...row })
			.onConflictDoUpdate({ target: [pricedResults.scenarioId, pricedResults.slot], set: row });
	} catch (error) {
		// The scenario may have been purged meanwhile: the figure is still right for this answer.
		logger.warn({ err: error, scenarioId, slot }, 'stored result not saved');
	}
}

/** Prices a scenario on a loaded tariff and stores an `ok` answer under its key. */
async function priceAndStore(
	site: SiteRow,
	scenario: ScenarioRow,
	period: PricedPeriod,
	tariff: UsableTariff,
	specs: DeviceSpec[],
	pinVersion?: number
) {
	const keyed = keyOf(site, scenario, tariff, period, pinVersion);
	const priced = await priceScenario(site, scenario, specs, period, pinVersion, tariff);
	const summary = priced.ok ? summaryOf(priced, specs) : null;
	if (keyed && priced.ok && summary)
		await store(scenario.id, slotOf(period, pinVersion), keyed, priced, summary);
	return { priced, summary };
}

const specsOf = async (scenarioId: string) =>
	(
		await db
			.select({ spec: devices.spec })
			.from(devices)
			.where(eq(devices.scenarioId, scenarioId))
			.orderBy(devices.position)
	).map((d) => d.spec);

/**
 * A stored scenario's priced result over `period` (on the pinned version, if given): the stored one
 * while its key matches, else priced now and stored. The caller has checked access to the scenario.
 */
export async function storedPrice(
	site: SiteRow,
	scenario: ScenarioRow,
	period: PricedPeriod,
	pinVersion?: number
): Promise<Priced> {
	const id = tariffIdOf(site, scenario);
	const tariff = id ? await usableTariff(site.workspaceId, id) : null;
	const keyed = keyOf(site, scenario, tariff, period, pinVersion);
	if (keyed) {
		const [row] = await db
			.select({ inputKey: pricedResults.inputKey, result: pricedResults.result })
			.from(pricedResults)
			.where(
				and(eq(pricedResults.scenarioId, scenario.id), eq(pricedResults.slot, slotOf(period, pinVersion)))
			);
		if (row?.inputKey === keyed.key) return { ok: true, ...(row.result as Omit<PricedOk, 'ok'>) };
	}
	return (await priceAndStore(site, scenario, period, tariff, await specsOf(scenario.id), pinVersion)).priced;
}

/**
 * Summaries of many stored scenarios (of one workspace's sites) over one period, by scenario id, in a fixed
 * number of queries however many there are: their tariffs, their stored summaries, and the devices of the
 * ones not stored under their current key, which are priced and stored now.
 */
export async function storedSummaries(
	workspaceId: string,
	entries: { site: SiteRow; scenario: ScenarioRow }[],
	period: PricedPeriod
): Promise<Map<string, SummaryOrProblem>> {
	const slot = slotOf(period);
	const ids = entries.map((e) => e.scenario.id);
	const tariffIds = entries.map((e) => tariffIdOf(e.site, e.scenario)).filter((id) => id !== null);
	const [tariffs, rows] = await Promise.all([
		usableTariffs(workspaceId, tariffIds),
		ids.length
			? db
					.select({
						scenarioId: pricedResults.scenarioId,
						inputKey: pricedResults.inputKey,
						summary: pricedResults.summary
					})
					.from(pricedResults)
					.where(and(inArray(pricedResults.scenarioId, ids), eq(pricedResults.slot, slot)))
			: []
	]);
	const stored = new Map(rows.map((r) => [r.scenarioId, r]));
	const out = new Map<string, SummaryOrProblem>();
	const misses: typeof entries = [];
	for (const entry of entries) {
		const id = tariffIdOf(entry.site, entry.scenario);
		const keyed = keyOf(entry.site, entry.scenario, (id && tariffs.get(id)) || null, period);
		const row = stored.get(entry.scenario.id);
		if (keyed && row?.inputKey === keyed.key)
			out.set(entry.scenario.id, { ok: true, summary: row.summary as PricedSummary });
		else misses.push(entry);
	}
	if (misses.length === 0) return out;
	const specs = new Map<string, DeviceSpec[]>();
	const found = await db
		.select({ scenarioId: devices.scenarioId, spec: devices.spec })
		.from(devices)
		.where(
			inArray(
				devices.scenarioId,
				misses.map((m) => m.scenario.id)
			)
		)
		.orderBy(devices.position);
	for (const d of found) {
		const list = specs.get(d.scenarioId);
		if (list) list.push(d.spec);
		else specs.set(d.scenarioId, [d.spec]);
	}
	for (const { site, scenario } of misses) {
		const list = specs.get(scenario.id) ?? [];
		const id = tariffIdOf(site, scenario);
		// Unknown or not usable: priceScenario's own refusal names it (null stands for "read, and not found").
		const tariff = id ? (tariffs.get(id) ?? null) : null;
		const { priced, summary } = await priceAndStore(site, scenario, period, tariff, list);
		out.set(
			scenario.id,
			priced.ok && summary
				? { ok: true, summary }
				: {
						ok: false,
						message: priced.ok ? '' : priced.message,
						deviceCount: list.length,
						caution: needsElectricalCaution(list)
					}
		);
	}
	return out;
}
