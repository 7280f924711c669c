// What a stored priced result depends on, and the key it is stored under: pure, so it is the same in every
// process and unit-tested without a database.
import { createHash } from 'node:crypto';
import stringify from 'safe-stable-stringify';
import { RULES_VERSION } from '$lib/calc';
import type { HolidayRule } from '../db/schema';

let rulesVersion = RULES_VERSION;

/** The rules version keys are made with: RULES_VERSION, unless a test priced as if it were bumped. */
export const currentRulesVersion = () => rulesVersion;

/** Tests only: key results as if the rules were at version `version` (undefined: back to RULES_VERSION). */
export function useRulesVersionForTest(version?: number) {
	rulesVersion = version ?? RULES_VERSION;
}

/** The hex SHA-256 of a value's stable JSON (object keys sorted, so the order they were built in never counts). */
export const hashOf = (value: unknown) =>
	createHash('sha256')
		.update(stringify(value) ?? 'null')
		.digest('hex');

export type PricedPeriod =
	{ start: string; months: number } | { billingPeriods: { from: string; to: string }[] };

/** The pieces of a site, scenario and tariff a priced result is made from. */
export interface KeyInputs {
	site: {
		timezone: string;
		country: string;
		region: string | null;
		tariffId: string | null;
		tariffVersion: number | null;
	};
	scenario: { id: string; revision: number; tariffId: string | null; tariffVersion: number | null };
	tariff: {
		tariff: { id: string; revision: number; holidays: HolidayRule | null };
		versions: { id: string; number: number; effectiveFrom: string; effectiveTo: string | null }[];
	};
	period: PricedPeriod;
	pinVersion?: number;
}

/**
 * Everything a scenario's priced result depends on, in words (stored as `depends_on`): the rules version,
 * the scenario's revision (bumped by every change to its devices, air design, tariff or details), the
 * tariff's revision (its name and holidays) and every version of it with its dates, the version pinned,
 * the period, the site's time zone and the holidays priced on (the tariff's own, else the site's place).
 */
export function dependsOn(inputs: KeyInputs) {
	const { site, scenario, tariff, period } = inputs;
	return {
		rulesVersion,
		scenario: { id: scenario.id, revision: scenario.revision },
		tariff: {
			id: tariff.tariff.id,
			revision: tariff.tariff.revision,
			versions: [...tariff.versions]
				.sort((a, b) => a.number - b.number)
				.map((v) => ({ id: v.id, number: v.number, from: v.effectiveFrom, to: v.effectiveTo }))
		},
		pinned: inputs.pinVersion ?? (scenario.tariffId ? scenario.tariffVersion : site.tariffVersion) ?? null,
		period,
		timezone: site.timezone,
		holidays: tariff.tariff.holidays ?? { country: site.country, region: site.region ?? null }
	};
}

/** The key a stored result must carry to be served: the hash of what it depends on. */
export const inputKeyOf = (inputs: KeyInputs) => hashOf(dependsOn(inputs));

/**
 * The slot a result is stored in, one row per scenario and slot: the period (a run of bills by its first
 * day; all their dates are in the key) and the pinned version if any. A new figure for the slot replaces
 * the old one, so a scenario holds as many rows as the periods and pins read of it.
 */
export function slotOf(period: PricedPeriod, pinVersion?: number) {
	const base =
		'start' in period
			? `months:${period.start}+${period.months}`
			: `bills:${period.billingPeriods[0]?.from ?? ''}`;
	return pinVersion === undefined ? base : `${base}:v${pinVersion}`;
}

/** The slot of a calendar year's twelve months, what the dashboard and the site page read. */
export const yearSlot = (year: number) => slotOf({ start: `${year}-01`, months: 12 });
