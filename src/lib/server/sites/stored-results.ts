// A stored scenario's priced result, kept in PostgreSQL (`priced_result`) under the key of everything it
// depends on (stored-key.ts) and priced again only when that key changes. Only a stored scenario's own
// devices are priced through here: an edited list not yet saved goes to priceScenario directly.
import { and, eq, sql } from 'drizzle-orm';
import { needsElectricalCaution } from '$lib/cautions';
import { db } from '../db';
import { devices, pricedResults, type DeviceSpec } from '../db/schema';
import { logger } from '../log';
import { usableTariff } from '../tariffs/usable';
import { priceScenario, type Priced, type UsableTariff } from './results.service';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import {
	currentRulesVersion,
	dependsOn,
	hashOf,
	slotOf,
	type KeyInputs,
	type PricedPeriod
} from './stored-key';

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
export const tariffIdOf = (site: SiteRow, scenario: ScenarioRow) => scenario.tariffId ?? site.tariffId;

/** The key and its words for a scenario on a loaded tariff; null when there is nothing to key (no tariff). */
export function keyOf(
	site: SiteRow,
	scenario: ScenarioRow,
	tariff: KeyInputs['tariff'] | null,
	period: PricedPeriod,
	pinVersion?: number
) {
	if (!tariff) return null;
	const words = dependsOn({ site, scenario, tariff, period, pinVersion });
	return { words, key: hashOf(words) };
}

export type StoredRow = typeof pricedResults.$inferInsert;

/** The row that stores an `ok` result in its slot under its key. */
function rowOf(
	scenarioId: string,
	slot: string,
	keyed: NonNullable<ReturnType<typeof keyOf>>,
	{ ok: _ok, ...result }: PricedOk,
	summary: PricedSummary
): StoredRow {
	const rulesVersion = currentRulesVersion();
	const at = new Date();
	return {
		scenarioId,
		slot,
		inputKey: keyed.key,
		rulesVersion,
		dependsOn: keyed.words,
		result,
		summary,
		computedAt: at
	};
}

/**
 * Stores rows in one statement, each replacing what its slot held. A failed write costs only a recompute
 * on the next read (a scenario purged meanwhile, say): the figures answered are right either way.
 */
export async function store(rows: StoredRow[]) {
	if (rows.length === 0) return;
	const fresh = (column: string) => sql.raw(`excluded.${column}`);
	try {
		await db
			.insert(pricedResults)
			.values(rows)
			.onConflictDoUpdate({
				target: [pricedResults.scenarioId, pricedResults.slot],
				set: {
					inputKey: fresh('input_key'),
					rulesVersion: fresh('rules_version'),
					dependsOn: fresh('depends_on'),
					result: fresh('result'),
					summary: fresh('summary'),
					computedAt: fresh('computed_at')
				}
			});
	} catch (error) {
		logger.warn({ err: error, slots: rows.length }, 'stored results not saved');
	}
}

/** Prices a scenario on a loaded tariff; an `ok` answer comes with the row that stores it under its key. */
export async function priceForStore(
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
	const row =
		keyed && priced.ok && summary
			? rowOf(scenario.id, slotOf(period, pinVersion), keyed, priced, summary)
			: null;
	return { priced, summary, row };
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
	const specs = await specsOf(scenario.id);
	const { priced, row } = await priceForStore(site, scenario, period, tariff, specs, pinVersion);
	if (row) await store([row]);
	return priced;
}
