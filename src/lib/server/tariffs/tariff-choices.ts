// The tariffs a site form or a scenario's details offer: own ones in full, the public library by search.
import { asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { tariffs } from '../db/schema';
import { findTariff, searchTariffs, withVersions, type TariffRow, type VersionRow } from './tariff.service';
import { mayChoose, type TariffChooser } from './usable';
import {
	PUBLIC_CHOICES,
	type TariffChoice,
	type TariffChoices
} from '$lib/components/site-form/tariff-choice';

export { PUBLIC_CHOICES };

/**
 * A workspace's own tariffs are all offered, up to this many (typed in or imported one at a time, a
 * workspace has tens); the bound keeps one page's work finite whatever is stored.
 */
export const OWN_CHOICES = 1000;

const choiceOf = (guest: boolean, tariff: TariffRow, versions: VersionRow[]): TariffChoice => ({
	id: tariff.id,
	label: `${tariff.utility} — ${tariff.name}${tariff.workspaceId ? (guest ? " (this site's)" : ' (ours)') : ''}`,
	currency: tariff.currency,
	versions: versions.map((v) => ({ number: v.number, effectiveFrom: v.effectiveFrom }))
});

/** A workspace's private tariffs by utility and name, each with its versions. */
async function workspaceTariffs(workspaceId: string) {
	const rows = await db
		.select()
		.from(tariffs)
		.where(eq(tariffs.workspaceId, workspaceId))
		.orderBy(asc(tariffs.utility), asc(tariffs.name))
		.limit(OWN_CHOICES);
	return withVersions(rows);
}

/**
 * The tariffs a site form offers this chooser. A member sees the workspace's own tariffs, all of them; a
 * guest of one site sees only the tariffs already chosen (`guestKeeps`). The public library answers
 * `search` (utility, name, code, area or open-data label), 50 tariffs at most. The tariffs chosen now
 * (`current`: the site's, the scenario's) are always offered when the chooser may choose them, so saving
 * the form unchanged keeps them. The list is a convenience: the choice is checked again at save.
 */
export async function tariffChoices(
	chooser: TariffChooser,
	options: { search?: string; current?: readonly (string | null)[] } = {}
): Promise<TariffChoices> {
	const guest = !!chooser.guestKeeps;
	const search = options.search?.trim().slice(0, 100) ?? '';
	const own = guest ? [] : await workspaceTariffs(chooser.workspaceId);
	const found = await searchTariffs([], {
		q: search || undefined,
		scope: 'public',
		sort: 'utility',
		pageSize: PUBLIC_CHOICES
	});
	const shown = [...own, ...found.items];
	const wanted = [...(options.current ?? []), ...(chooser.guestKeeps ?? [])];
	const missing = [...new Set(wanted)].filter(
		(id): id is string => !!id && !shown.some((s) => s.tariff.id === id)
	);
	const publicItems = [...found.items];
	for (const kept of await Promise.all(missing.map((id) => findTariff(id)))) {
		if (!kept || !mayChoose(chooser, kept.tariff)) continue;
		if (kept.tariff.workspaceId) own.push(kept);
		else publicItems.unshift(kept);
	}
	return {
		own: {
			label: guest ? "This site's tariffs" : "Our workspace's tariffs",
			choices: own.map(({ tariff, versions }) => choiceOf(guest, tariff, versions))
		},
		public: {
			label: 'Public library',
			choices: publicItems.map(({ tariff, versions }) => choiceOf(guest, tariff, versions))
		},
		search,
		found: found.total
	};
}

/** Every choice of the groups, own ones first (for a page that lists them without groups). */
export const allChoices = (choices: TariffChoices) => [...choices.own.choices, ...choices.public.choices];
