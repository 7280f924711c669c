// A comparison's core result kept in PostgreSQL under its baseline scenario, so the compare page and its
// exports read it instead of running compare() again for the same scenarios and query.
import { and, eq } from 'drizzle-orm';
import { compare, type CompareRequest } from '$lib/calc';
import { db } from '$lib/server/db';
import { pricedResults } from '$lib/server/db/schema';
import { logger } from '$lib/server/log';
import { currentRulesVersion, hashOf } from '$lib/server/sites/stored-key';

type CompareResult = ReturnType<typeof compare>;

/**
 * compare() of `request`, stored: the slot is the set of scenarios compared (one row per set, replaced when
 * anything changes), the key the hash of the whole request the core is given — every scenario's devices,
 * statuses, one-off costs and tariff version, the period, time zone, holidays and finance — and the rules
 * version. Hashing the request itself rather than revisions means no input can be left out of the key.
 */
export async function storedCompare(
	request: CompareRequest,
	baselineScenarioId: string,
	scenarioIds: string[]
): Promise<CompareResult> {
	const slot = `compare:${hashOf(scenarioIds).slice(0, 32)}`;
	const key = hashOf({ rulesVersion: currentRulesVersion(), request });
	const where = and(eq(pricedResults.scenarioId, baselineScenarioId), eq(pricedResults.slot, slot));
	const [row] = await db
		.select({ inputKey: pricedResults.inputKey, result: pricedResults.result })
		.from(pricedResults)
		.where(where);
	if (row?.inputKey === key) return row.result as CompareResult;
	const result = compare(request);
	const stored = {
		inputKey: key,
		rulesVersion: currentRulesVersion(),
		dependsOn: {
			rulesVersion: currentRulesVersion(),
			scenarios: scenarioIds,
			request: 'hashed in input_key'
		},
		result,
		summary: { scenarios: scenarioIds.length },
		computedAt: new Date()
	};
	try {
		await db
			.insert(pricedResults)
			.values({ scenarioId: baselineScenarioId, slot, ...stored })
			.onConflictDoUpdate({ target: [pricedResults.scenarioId, pricedResults.slot], set: stored });
	} catch (error) {
		logger.warn({ err: error, slot }, 'stored comparison not saved');
	}
	return result;
}
