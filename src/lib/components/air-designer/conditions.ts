// The water a design works in. On a scenario the site's tanks say it (the core's `designConditions`);
// on the public page the person types it: temperature, fresh or sea water, altitude, and the fish's
// oxygen demand from their feed or in grams an hour.
import { z } from 'zod';
import {
	type AirDesign,
	amount,
	type DesignConditions,
	designConditions,
	type SiteWater,
	oxygenDemandGramsPerHour,
	parseRequest,
	type RequestIssue,
	SALINITY_G_PER_KG,
	WATER_KINDS
} from '$lib/calc';
import type { NumberDraft } from '$lib/components/fields/number-text';

export type DemandKind = 'none' | 'feed' | 'direct';

/** The public page's water and stock, as typed. */
export type ConditionsDraft = {
	temperatureC: NumberDraft;
	water: (typeof WATER_KINDS)[number];
	altitudeM: NumberDraft;
	demand: DemandKind;
	feedKgPerDay: NumberDraft;
	proteinPercent: NumberDraft;
	oxygenGramsPerHour: NumberDraft;
};

/** Fresh water at 20 °C at sea level, no stock given: the conditions of the worked example. */
export const blankConditions = (): ConditionsDraft => ({
	temperatureC: 20,
	water: 'fresh',
	altitudeM: 0,
	demand: 'none',
	feedKgPerDay: 1,
	proteinPercent: 35,
	oxygenGramsPerHour: 10
});

// The same bounds as a tank of the site form (site-water.schema.ts), so both pages accept the same water.
const conditionsSchema = z.object({
	temperatureC: amount('Water temperature', { min: 0, max: 40 }),
	altitudeM: amount('Altitude', { min: -500, max: 6000 })
});
const feedSchema = z.object({
	feedKgPerDay: amount('Daily feed', { min: 0, max: 1_000_000 }),
	proteinPercent: amount('Feed protein', { min: 0, max: 100 })
});
const directSchema = z.object({ oxygenGramsPerHour: amount('Oxygen demand', { min: 0, max: 10_000_000 }) });

/** The conditions for the core, or each problem once at its field's name. */
export function checkConditions(
	draft: ConditionsDraft
): { conditions: DesignConditions; issues: [] } | { conditions: null; issues: RequestIssue[] } {
	const water = parseRequest(conditionsSchema, draft);
	const demandSchema = draft.demand === 'feed' ? feedSchema : draft.demand === 'direct' ? directSchema : null;
	const demand = demandSchema ? parseRequest(demandSchema, draft) : null;
	const issues = [
		...(water.success ? [] : water.error.issues),
		...(demand && !demand.success ? demand.error.issues : [])
	];
	if (!water.success || (demand && !demand.success)) return { conditions: null, issues };
	const given = demand?.success ? (demand.data as Record<string, number>) : null;
	return {
		conditions: {
			temperatureC: water.data.temperatureC,
			salinityGPerKg: SALINITY_G_PER_KG[draft.water],
			altitudeM: water.data.altitudeM,
			oxygenDemandGramsPerHour:
				given === null
					? null
					: oxygenDemandGramsPerHour(
							'oxygenGramsPerHour' in given
								? { oxygenGramsPerHour: given.oxygenGramsPerHour! }
								: { feedKgPerDay: given.feedKgPerDay!, proteinPercent: given.proteinPercent! }
						),
			tankVolumeLiters: null
		},
		issues: []
	};
}

/**
 * A scenario's conditions: the aerated tank's water, or the core's default water when the design has no
 * aeration (the server's `saveAirDesign` reads a design the same way). A tank no longer at the site is
 * named at the tank's field, so a result is never worked out for water that is not there.
 */
export function siteConditions(
	water: SiteWater,
	design: AirDesign | null
): { conditions: DesignConditions; issues: [] } | { conditions: null; issues: RequestIssue[] } {
	const tankId = design?.aeration?.tankId ?? null;
	if (tankId !== null && !water.tanks.some((tank) => tank.id === tankId))
		return { conditions: null, issues: [{ path: 'aeration.tankId', message: TANK_GONE }] };
	return { conditions: designConditions(water, tankId), issues: [] };
}

export const TANK_GONE = "That tank is no longer among the site's tanks: choose another";
