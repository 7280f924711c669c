import { priceRun, totalsOf, withYearlyMinimums } from './calculate';
import type { MeasuredPeak } from './demand-charges';
import { billingSpans, type BillingSpan } from './periods';
import type { CalculateRequest } from './request.schema';
import type { Tariff } from './tariff.schema';
import type { CalculateResponse } from './types';

/** One published version of a tariff, as the library stores it. Dates are ISO, inclusive. */
export interface DatedTariff {
	id: string;
	number: number;
	effectiveFrom: string;
	effectiveTo: string | null;
	tariff: Tariff;
}

/**
 * The version in force on a date: the latest `effectiveFrom` on or before it whose `effectiveTo` (if any)
 * is not before it; of two versions effective the same day, the later-published (higher number) wins.
 * ISO dates compare correctly as strings.
 */
export function versionInForce<V extends Omit<DatedTariff, 'tariff'>>(
	versions: readonly V[],
	isoDate: string
): V | null {
	let best: V | null = null;
	for (const v of versions) {
		if (v.effectiveFrom > isoDate || (v.effectiveTo !== null && v.effectiveTo < isoDate)) continue;
		if (
			!best ||
			v.effectiveFrom > best.effectiveFrom ||
			(v.effectiveFrom === best.effectiveFrom && v.number > best.number)
		)
			best = v;
	}
	return best;
}

export class NoVersionInForce extends Error {
	constructor(readonly date: string) {
		super(`No version of this tariff is in force on ${date}`);
	}
}

export type VersionedResponse = CalculateResponse & {
	versions: { label: string; versionId: string; number: number }[];
	/**
	 * Periods that start before the tariff's earliest version and were priced on it anyway (only with
	 * `beforeFirst: 'earliest'`): the labels, and the version with its first day, for the note a page shows.
	 */
	beforeFirst?: { labels: string[]; number: number; effectiveFrom: string };
};

/**
 * What to do with a billing period that starts before any version is in force: refuse the request
 * (`'refuse'`, the default: NoVersionInForce names the date) or price it on the earliest version and say
 * so (`'earliest'`). A site's year on a tariff whose first version is dated today would otherwise have no
 * rates for its earlier months; pricing them on that version, with a note, keeps the year whole.
 */
export type BeforeFirstVersion = 'refuse' | 'earliest';

/** The version that starts first (of two the same day, the later-published). */
function earliestVersion<V extends Omit<DatedTariff, 'tariff'>>(versions: readonly V[]): V | null {
	let first: V | null = null;
	for (const v of versions)
		if (
			!first ||
			v.effectiveFrom < first.effectiveFrom ||
			(v.effectiveFrom === first.effectiveFrom && v.number > first.number)
		)
			first = v;
	return first;
}

/**
 * Calculates with, for each billing period, the version in force on the period's first day (the rule
 * of the tariff library). Consecutive periods on the same version are priced together, so a year that
 * crosses one rate change costs two runs, but it stays one calculation: a ratchet in the second run
 * looks back on the whole-period peaks of the first run's months too, and the yearly minimum's years
 * count from the first period (see `yearlyMinimumTopUps`). So pricing on two versions that hold the
 * same tariff gives what one version gives. A pinned version is simply a one-element list.
 */
export function calculateAcrossVersions(
	request: CalculateRequest,
	versions: readonly DatedTariff[],
	beforeFirst: BeforeFirstVersion = 'refuse'
): VersionedResponse {
	const spans = billingSpans(request.period);
	const groups: { version: DatedTariff; spans: BillingSpan[]; firstIndex: number }[] = [];
	const first = earliestVersion(versions);
	const early: string[] = [];
	spans.forEach((span, index) => {
		let version = versionInForce(versions, span.from);
		if (!version && beforeFirst === 'earliest' && first && span.from < first.effectiveFrom) {
			version = first;
			early.push(span.label);
		}
		if (!version) throw new NoVersionInForce(span.from);
		const last = groups.at(-1);
		if (last && last.version.id === version.id) last.spans.push(span);
		else groups.push({ version, spans: [span], firstIndex: index });
	});

	// One calculation: each run sees the peaks of the runs before (a ratchet's history) and the years
	// of a yearly minimum run from the first period, whatever version each period is on.
	const history: MeasuredPeak[] = [];
	const priced = groups.flatMap((group) => {
		const period: CalculateRequest['period'] =
			'months' in request.period
				? { start: group.spans[0]!.label, months: group.spans.length }
				: { billingPeriods: group.spans.map(({ from, to }) => ({ from, to })) };
		const { tariff } = group.version;
		const run = priceRun({ ...request, period, tariff }, history);
		history.push(...run.map((p) => p.peak));
		return run.map((p) => ({ priced: p, perYear: tariff.minimumPerYear }));
	});
	const periods = withYearlyMinimums(priced);
	return {
		currency: groups[0]?.version.tariff.currency ?? request.tariff.currency,
		periods,
		totals: totalsOf(periods),
		versions: groups.flatMap((g) =>
			g.spans.map((s) => ({ label: s.label, versionId: g.version.id, number: g.version.number }))
		),
		...(early.length && first
			? { beforeFirst: { labels: early, number: first.number, effectiveFrom: first.effectiveFrom } }
			: {})
	};
}
