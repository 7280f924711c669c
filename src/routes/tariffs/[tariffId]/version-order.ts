/**
 * The order the tariff page lists versions in: the one in force today first, then the earlier ones
 * (newest in force first), and apart, below, the versions not yet in force (soonest first), each
 * shown as "from <date>". A version published ahead of its date never heads the list.
 */
export interface DatedVersion {
	number: number;
	effectiveFrom: string;
	effectiveTo: string | null;
}

export interface VersionOrder<V> {
	/** In force today and earlier ones, newest in force first. */
	inForceAndEarlier: V[];
	/** Starting after today, soonest first. */
	future: V[];
}

const byStart = (a: DatedVersion, b: DatedVersion) =>
	a.effectiveFrom.localeCompare(b.effectiveFrom) || a.number - b.number;

/** Splits and orders versions around `today` ("YYYY-MM-DD"; ISO dates compare as strings). */
export function versionOrder<V extends DatedVersion>(versions: readonly V[], today: string): VersionOrder<V> {
	const sorted = [...versions].sort(byStart);
	return {
		inForceAndEarlier: sorted.filter((v) => v.effectiveFrom <= today).reverse(),
		future: sorted.filter((v) => v.effectiveFrom > today)
	};
}

/** The version before this one in force order, which its "what changed" compares against. */
export function previousVersion<V extends DatedVersion>(versions: readonly V[], version: V): V | undefined {
	const sorted = [...versions].sort(byStart);
	return sorted[sorted.indexOf(version) - 1];
}
