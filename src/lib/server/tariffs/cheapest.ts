// "Which tariff is cheapest?": a site's metered year priced on every tariff it may use, ranked.
import { DateTime } from 'luxon';
import { tariffSchema, type DatedTariff } from '$lib/calc';
import type { SiteRow } from '$lib/server/sites/site.service';
import { meteredYear } from '$lib/server/usage/metered-year';
import { equipmentOf } from '$lib/server/sites/results.service';
import { listDevices } from '$lib/server/sites/equipment.service';
import type { ScenarioRow } from '$lib/server/sites/scenario.service';
import { monthName } from '$lib/server/usage/metered-series';
import type { RankedTariff, UnpricedTariff, WithProvenance } from '$lib/cheapest/types';
import { rankTariffs, type Candidate, type Ranking, type YearContext } from './cheapest-rank';
import { provenanceOf, type StoredTariff } from './cheapest-sources';
import { cheapestWords } from './cheapest-words';
import { findTariff, searchTariffs, type TariffRow, type VersionRow } from './tariff.service';
import { tariffUsableBy } from './usable';

/** The most tariffs one page prices (the library's largest page); the page says when there are more. */
const MAX_COMPARED = 100;

export type Cheapest =
	| {
			ok: false;
			message: string;
			/** The caller's budget is spent: a 429, not a fact of the site. */ limited?: true;
	  }
	| (Omit<Ranking, 'ranked' | 'unpriced'> & {
			ok: true;
			ranked: WithProvenance<RankedTariff>[];
			unpriced: WithProvenance<UnpricedTariff>[];
			/** "December 2026 – November 2027, 35,040 values of 15 minutes" */
			priced: string;
			currency: string;
			words: string[];
			/** How many tariffs the site may use in all, when more than were compared. */
			moreThanCompared: number | null;
	  });

function datedVersions(row: TariffRow, versions: VersionRow[], pinned: number | null): DatedTariff[] {
	const chosen = pinned ? versions.filter((v) => v.number === pinned) : [];
	return (chosen.length ? chosen : versions).flatMap((v) => {
		const parsed = tariffSchema.safeParse(v.structure);
		if (!parsed.success) return [];
		return [
			{
				id: v.id,
				number: v.number,
				effectiveFrom: chosen.length ? '0000-01-01' : v.effectiveFrom,
				effectiveTo: chosen.length ? null : v.effectiveTo,
				tariff: parsed.data
			}
		];
	});
}

/**
 * The tariffs this site may use: the public library and, for members, the workspace's own; a guest of
 * the site (`viaGrant`) sees public ones and the site's current tariff. Each is checked again with
 * `tariffUsableBy` here, where its rates are used. The current tariff keeps its pinned version, as the
 * site page prices it.
 */
async function candidatesFor(site: SiteRow, viaGrant: boolean) {
	const { items, total } = await searchTariffs(viaGrant ? [] : [site.workspaceId], {
		sort: 'utility',
		pageSize: MAX_COMPARED
	});
	if (site.tariffId && !items.some((i) => i.tariff.id === site.tariffId)) {
		const current = await findTariff(site.tariffId);
		if (current) items.push(current);
	}
	const usable = items.filter(({ tariff }) => tariffUsableBy(site.workspaceId, tariff));
	const candidates: Candidate[] = usable.map(({ tariff, versions }) => ({
		id: tariff.id,
		name: tariff.name,
		utility: tariff.utility,
		currency: tariff.currency,
		holidays: tariff.holidays,
		versions: datedVersions(tariff, versions, tariff.id === site.tariffId ? site.tariffVersion : null)
	}));
	return { candidates, stored: new Map<string, StoredTariff>(usable.map((i) => [i.tariff.id, i])), total };
}

/** Ranks the candidates on `load` and explains the top one; `priced` says which months and which load. */
async function rankAndExplain(
	site: SiteRow,
	viaGrant: boolean,
	load: Pick<YearContext, 'meter' | 'equipment' | 'firstMonth'>,
	currentTariffId: string | null,
	priced: string
): Promise<Cheapest> {
	const { candidates, stored, total } = await candidatesFor(site, viaGrant);
	const ranking = rankTariffs(candidates, {
		...load,
		timezone: site.timezone,
		siteHolidays: { country: site.country, ...(site.region ? { region: site.region } : {}) },
		currency: site.currency,
		currentTariffId
	});
	const top = ranking.ranked[0];
	const current = ranking.ranked.find((r) => r.current) ?? null;
	const pinnedOf = (id: string) => (id === site.tariffId ? site.tariffVersion : null);
	const withSources = <T extends { id: string }>(row: T, numbers: number[]) => ({
		...row,
		provenance: provenanceOf(stored.get(row.id)!, numbers, pinnedOf(row.id))
	});
	return {
		ok: true,
		...ranking,
		ranked: ranking.ranked.map((r) => withSources(r, r.versionNumbers)),
		unpriced: ranking.unpriced.map((u) => withSources(u, [])),
		priced,
		currency: site.currency,
		words: top ? cheapestWords(top, current, ranking.topShares, site.currency) : [],
		moreThanCompared: total > MAX_COMPARED ? total : null
	};
}

/**
 * Prices the site's last 12 whole metered months on each tariff it may use, within the page's load:
 * the ranking, the tariffs not priced and why, and the top one explained in words. A site without a
 * year of whole, gap-free readings gets the message saying what is missing instead.
 */
export async function cheapestTariffs(site: SiteRow, viaGrant: boolean): Promise<Cheapest> {
	const year = await meteredYear(site);
	if (!year.ok) return year;
	const load = { meter: year.meter, firstMonth: year.firstMonth };
	return rankAndExplain(site, viaGrant, load, site.tariffId, year.label ?? year.firstMonth);
}

/**
 * The same ranking for a scenario's estimated load (its equipment list) over the 12 months from
 * `firstMonth` ('YYYY-MM'; the page's default is the coming year, see `firstMonthOf`), so an adviser can
 * pair a schedule change with a tariff change. The scenario's own tariff, else the site's, is the current
 * one. The caller checks the scenario is the site's.
 */
export async function cheapestForScenario(
	site: SiteRow,
	viaGrant: boolean,
	scenario: ScenarioRow,
	firstMonth: string
): Promise<Cheapest> {
	const devices = await listDevices(scenario.id);
	if (!devices.length)
		return { ok: false, message: `The scenario “${scenario.name}” has no equipment to price yet.` };
	const from = DateTime.fromFormat(firstMonth, 'yyyy-MM', { zone: site.timezone });
	const priced = `${monthName(from)} – ${monthName(from.plus({ months: 11 }))}, the estimated load of the scenario “${scenario.name}”`;
	const load = { equipment: devices.map((d) => equipmentOf(d.spec)), firstMonth };
	return rankAndExplain(site, viaGrant, load, scenario.tariffId ?? site.tariffId, priced);
}
