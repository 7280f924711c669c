import {
	calculateAcrossVersions,
	calculateRequestSchema,
	parseRequest,
	tariffSchema,
	type DatedTariff,
	type InvalidRequest,
	type VersionedResponse
} from '$lib/calc';
import type { DeviceSpec } from '../db/schema';
import type { ScenarioRow, SiteRow } from './site.service';
import { findTariff } from './tariff.service';

export type Priced =
	| { ok: true; result: VersionedResponse; tariff: { id: string; name: string; utility: string } }
	| { ok: false; reason: 'no-tariff' | 'invalid'; message: string; invalid?: InvalidRequest };

/** The tariff a scenario is priced on: its own override, else the site's; a pinned version applies to every period. */
export async function tariffFor(site: SiteRow, scenario: ScenarioRow | null, pinVersion?: number) {
	const id = scenario?.tariffId ?? site.tariffId;
	const pinned = pinVersion ?? (scenario?.tariffId ? scenario.tariffVersion : site.tariffVersion);
	if (!id) return null;
	const found = await findTariff(id);
	if (!found || found.versions.length === 0) return null;
	const chosen = pinned ? found.versions.filter((v) => v.number === pinned) : found.versions;
	const versions: DatedTariff[] = (chosen.length ? chosen : found.versions).map((v) => ({
		id: v.id,
		number: v.number,
		effectiveFrom: pinned ? '0000-01-01' : v.effectiveFrom,
		effectiveTo: pinned ? null : v.effectiveTo,
		tariff: tariffSchema.parse(v.structure)
	}));
	return { tariff: found.tariff, versions };
}

/** The core's equipment shape from a stored device (the safety flags and notes stay behind). */
export const equipmentOf = ({ inWater: _w, outdoor: _o, notes: _n, ...equipment }: DeviceSpec) => equipment;

/** Prices a scenario's equipment over calendar months (or a bill's period) on its tariff, in the site's time zone. */
export async function priceScenario(
	site: SiteRow,
	scenario: ScenarioRow | null,
	specs: DeviceSpec[],
	period: { start: string; months: number } | { billingPeriods: { from: string; to: string }[] },
	pinVersion?: number
): Promise<Priced> {
	const resolved = await tariffFor(site, scenario, pinVersion);
	if (!resolved)
		return { ok: false, reason: 'no-tariff', message: 'Pick a tariff for this site to see costs.' };
	const holidays = resolved.tariff.holidays ?? {
		country: site.country,
		...(site.region ? { region: site.region } : {})
	};
	const parsed = parseRequest(calculateRequestSchema, {
		period,
		timezone: site.timezone,
		holidays,
		tariff: resolved.versions.at(-1)!.tariff,
		equipment: specs.map(equipmentOf)
	});
	if (!parsed.success) {
		// A region date-holidays does not know falls back to the country, then to none.
		return {
			ok: false,
			reason: 'invalid',
			message: parsed.error.issues[0]?.message ?? 'This scenario cannot be priced.',
			invalid: parsed.error
		};
	}
	try {
		return {
			ok: true,
			result: calculateAcrossVersions(parsed.data, resolved.versions),
			tariff: { id: resolved.tariff.id, name: resolved.tariff.name, utility: resolved.tariff.utility }
		};
	} catch (error) {
		return { ok: false, reason: 'invalid', message: (error as Error).message };
	}
}
