// Many stored scenarios' summaries at once (the sites dashboard, the site page): a fixed number of queries
// however many scenarios there are, and only the ones not stored under their current key are priced.
import { setImmediate as yieldToOthers } from 'node:timers/promises';
import { and, eq, inArray } from 'drizzle-orm';
import { needsElectricalCaution } from '$lib/cautions';
import { db } from '../db';
import { devices, pricedResults, type DeviceSpec } from '../db/schema';
import { usableTariffKeys, usableTariffs } from '../tariffs/usable';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import { slotOf, type PricedPeriod } from './stored-key';
import {
	keyOf,
	priceForStore,
	store,
	tariffIdOf,
	type PricedSummary,
	type StoredRow,
	type SummaryOrProblem
} from './stored-results';

/**
 * Summaries of many stored scenarios (of one workspace's sites) over one period, by scenario id, in a fixed
 * number of queries however many there are: their tariffs, their stored summaries, and the devices of the
 * ones not stored under their current key, which are priced and stored now.
 */
export async function storedSummaries(
	workspaceId: string,
	entries: { site: SiteRow; scenario: ScenarioRow }[],
	period: PricedPeriod,
	/** The stored rows of the period's slot when the caller read them already (in its own query). */
	preread?: Map<string, { inputKey: string; summary: unknown }>
): Promise<Map<string, SummaryOrProblem>> {
	const ids = entries.map((e) => e.scenario.id);
	const tariffIds = entries.map((e) => tariffIdOf(e.site, e.scenario)).filter((id) => id !== null);
	const [tariffs, stored] = await Promise.all([
		usableTariffKeys(workspaceId, tariffIds),
		preread ?? storedOf(ids, slotOf(period))
	]);
	const out = new Map<string, SummaryOrProblem>();
	const misses: typeof entries = [];
	const missKeys: string[] = [];
	for (const entry of entries) {
		const id = tariffIdOf(entry.site, entry.scenario);
		const keyed = keyOf(entry.site, entry.scenario, (id && tariffs.get(id)) || null, period);
		const row = stored.get(entry.scenario.id);
		if (keyed && row?.inputKey === keyed.key)
			out.set(entry.scenario.id, { ok: true, summary: row.summary as PricedSummary });
		else {
			misses.push(entry);
			missKeys.push(`${entry.scenario.id}:${keyed?.key ?? 'unkeyed'}`);
		}
	}
	if (misses.length) {
		for (const [id, summary] of await pricedOnce(workspaceId, misses, missKeys, period)) out.set(id, summary);
	}
	return out;
}

/** The pricing of misses under way in this process, by what is priced (scenarios and their keys). */
const underWay = new Map<string, Promise<Map<string, SummaryOrProblem>>>();

/**
 * Prices these misses once however many views ask at the same moment: a view that finds the same misses
 * already being priced in this process waits for that pricing instead of starting its own. Without it,
 * fifty people opening a 200-site dashboard just after a tariff change each priced all 200 (about 340 ms
 * of CPU a view), the views queued behind one another and timed out before any result was stored.
 */
function pricedOnce(
	workspaceId: string,
	misses: { site: SiteRow; scenario: ScenarioRow }[],
	missKeys: string[],
	period: PricedPeriod
): Promise<Map<string, SummaryOrProblem>> {
	const flight = `${workspaceId}|${slotOf(period)}|${missKeys.join(',')}`;
	let pricing = underWay.get(flight);
	if (!pricing) {
		const priced = new Map<string, SummaryOrProblem>();
		pricing = priceMisses(workspaceId, misses, period, priced)
			.then(() => priced)
			.finally(() => underWay.delete(flight));
		underWay.set(flight, pricing);
	}
	return pricing;
}

/** The stored key and summary of each of these scenarios' slot, by scenario id. */
async function storedOf(ids: string[], slot: string) {
	const rows = ids.length
		? await db
				.select({
					scenarioId: pricedResults.scenarioId,
					inputKey: pricedResults.inputKey,
					summary: pricedResults.summary
				})
				.from(pricedResults)
				.where(and(inArray(pricedResults.scenarioId, ids), eq(pricedResults.slot, slot)))
		: [];
	return new Map<string, { inputKey: string; summary: unknown }>(rows.map((r) => [r.scenarioId, r]));
}

/**
 * Prices the scenarios not stored under their current key and stores them: their tariffs with the rates
 * and their devices are read here, in one query each.
 */
async function priceMisses(
	workspaceId: string,
	misses: { site: SiteRow; scenario: ScenarioRow }[],
	period: PricedPeriod,
	out: Map<string, SummaryOrProblem>
) {
	const tariffIds = misses.map((m) => tariffIdOf(m.site, m.scenario)).filter((id) => id !== null);
	const tariffs = await usableTariffs(workspaceId, tariffIds);
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
	const rows: StoredRow[] = [];
	for (const { site, scenario } of misses) {
		// Each scenario is a millisecond or two of pricing: other requests get their turn between them.
		await yieldToOthers();
		const list = specs.get(scenario.id) ?? [];
		const id = tariffIdOf(site, scenario);
		// Unknown or not usable: priceScenario's own refusal names it (null stands for "read, and not found").
		const tariff = id ? (tariffs.get(id) ?? null) : null;
		const { priced, summary, row } = await priceForStore(site, scenario, period, tariff, list);
		if (row) rows.push(row);
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
	await store(rows);
}
