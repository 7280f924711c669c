// Where each tariff on the cheapest-tariff page comes from: the stored versions' own words and dates.
import type { TariffProvenance, VersionSource } from '$lib/cheapest/types';
import type { TariffRow, VersionRow } from './tariff.service';

/** A tariff as read from the library, with every version. */
export type StoredTariff = { tariff: TariffRow; versions: VersionRow[] };

const sourceOf = (v: VersionRow): VersionSource => ({
	number: v.number,
	effectiveFrom: v.effectiveFrom,
	effectiveTo: v.effectiveTo,
	source: v.source,
	checkedOn: v.checkedOn
});

/**
 * What the versions numbered `numbers` say about their rates, in that order; with no numbers (a tariff
 * not priced), the version that would be read first: `pinned` when the site pins one, else the latest.
 */
export function provenanceOf(
	stored: StoredTariff,
	numbers: readonly number[],
	pinned: number | null = null
): TariffProvenance {
	const wanted = numbers.length
		? [...new Set(numbers)]
		: [pinned ?? Math.max(...stored.versions.map((v) => v.number))];
	return {
		urdbLabel: stored.tariff.urdbLabel,
		versions: wanted.flatMap((n) => stored.versions.filter((v) => v.number === n).map(sourceOf))
	};
}
