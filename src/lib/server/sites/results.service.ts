import {
	calculateAcrossVersions,
	calculateRequestSchema,
	parseRequest,
	tariffSchema,
	type DatedTariff,
	type InvalidRequest,
	type VersionedResponse
} from '$lib/calc';
import { beforeFirstVersionNote } from '$lib/text/tariff';
import type { DeviceSpec } from '../db/schema';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import { usableTariff, TARIFF_UNAVAILABLE } from '../tariffs/usable';
import type { TariffRow } from '../tariffs/tariff.service';

/** A scenario's priced year, or why it cannot be priced. */
export type Priced =
	| {
			ok: true;
			result: VersionedResponse;
			tariff: { id: string; name: string; utility: string };
			/** Said beside the figures when months before the tariff's first version were priced on it. */
			note: string | null;
	  }
	| {
			ok: false;
			reason: 'no-tariff' | 'unavailable' | 'invalid';
			message: string;
			invalid?: InvalidRequest;
	  };

/** The tariff versions a scenario is priced on, or why there are none. */
export type PricingTariff =
	| { ok: true; tariff: TariffRow; versions: DatedTariff[] }
	| { ok: false; reason: 'no-tariff' | 'unavailable' };

/** A tariff with its versions, as `usableTariff` reads it (null: unknown, or not this workspace's to use). */
export type UsableTariff = Awaited<ReturnType<typeof usableTariff>>;

/**
 * The tariff a scenario is priced on: its own override, else the site's; a pinned version applies to every
 * period. `loaded` is that tariff already read through `usableTariff` (a list prices many sites at once). A tariff the site's workspace may not use (another workspace's private one, however its id was
 * stored) is `unavailable`: nothing of it — name, source, rates — reaches a result, comparison or export.
 */
export async function tariffFor(
	site: SiteRow,
	scenario: ScenarioRow | null,
	pinVersion?: number,
	loaded?: UsableTariff | null
): Promise<PricingTariff> {
	const id = scenario?.tariffId ?? site.tariffId;
	const pinned = pinVersion ?? (scenario?.tariffId ? scenario.tariffVersion : site.tariffVersion);
	if (!id) return { ok: false, reason: 'no-tariff' };
	const found = loaded === undefined ? await usableTariff(site.workspaceId, id) : loaded;
	if (!found) return { ok: false, reason: 'unavailable' };
	if (found.versions.length === 0) return { ok: false, reason: 'no-tariff' };
	const chosen = pinned ? found.versions.filter((v) => v.number === pinned) : found.versions;
	const versions: DatedTariff[] = (chosen.length ? chosen : found.versions).map((v) => ({
		id: v.id,
		number: v.number,
		effectiveFrom: pinned ? '0000-01-01' : v.effectiveFrom,
		effectiveTo: pinned ? null : v.effectiveTo,
		tariff: tariffSchema.parse(v.structure)
	}));
	return { ok: true, tariff: found.tariff, versions };
}

/** The core's equipment shape from a stored device (the safety flags and notes stay behind). */
export const equipmentOf = ({ inWater: _w, outdoor: _o, notes: _n, ...equipment }: DeviceSpec) => equipment;

/** Prices a scenario's equipment over calendar months (or a bill's period) on its tariff, in the site's time zone. */
export async function priceScenario(
	site: SiteRow,
	scenario: ScenarioRow | null,
	specs: DeviceSpec[],
	period: { start: string; months: number } | { billingPeriods: { from: string; to: string }[] },
	pinVersion?: number,
	loaded?: UsableTariff | null
): Promise<Priced> {
	const resolved = await tariffFor(site, scenario, pinVersion, loaded);
	if (!resolved.ok)
		return {
			ok: false,
			reason: resolved.reason,
			message:
				resolved.reason === 'unavailable'
					? `${TARIFF_UNAVAILABLE}: pick another tariff to see costs.`
					: 'Pick a tariff for this site to see costs.'
		};
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
		// A site's calendar months before the tariff's first version (a first version dated today) are
		// priced on that version, with a note; a bill's own period before it is refused, naming its date.
		const result = calculateAcrossVersions(
			parsed.data,
			resolved.versions,
			'start' in period ? 'earliest' : 'refuse'
		);
		return {
			ok: true,
			result,
			tariff: { id: resolved.tariff.id, name: resolved.tariff.name, utility: resolved.tariff.utility },
			note: result.beforeFirst ? beforeFirstVersionNote(result.beforeFirst) : null
		};
	} catch (error) {
		return { ok: false, reason: 'invalid', message: (error as Error).message };
	}
}
