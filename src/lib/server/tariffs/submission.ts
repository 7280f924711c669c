import { z } from 'zod';
import {
	holidaysSchema,
	referenceMonthlyCost,
	tariffSchema,
	timezoneSchema,
	versionInForce
} from '$lib/calc';
import { tariffMetaSchema, versionMetaSchema } from '$lib/forms/tariff-meta.schema';
import type { VersionRow, TariffRow } from '$lib/server/tariffs/tariff.service';
import { MAX_REVISION } from '$lib/forms/storable';
import { tariffMeta } from './tariff-view';

/**
 * What the editor, the JSON upload and the API submit. The browser checks the same shapes; the server
 * adds what needs its data: a real IANA zone, a holiday calendar date-holidays knows.
 */
export const tariffSubmissionSchema = z
	.object({
		meta: tariffMetaSchema.extend({ timezone: timezoneSchema, holidays: holidaysSchema }),
		version: versionMetaSchema,
		structure: tariffSchema,
		expectedRevision: z.number().int().min(0).max(MAX_REVISION).optional()
	})
	.superRefine((s, ctx) => {
		if (s.structure.currency !== s.meta.currency)
			ctx.addIssue({
				code: 'custom',
				path: ['structure', 'currency'],
				message: `The charges are in ${s.structure.currency} but the tariff says ${s.meta.currency}`
			});
	});
export type TariffSubmission = z.output<typeof tariffSubmissionSchema>;

/** The portable JSON of one version: our documented export shape, accepted back by the editor's upload. */
export function exportVersion(tariff: TariffRow, version: VersionRow) {
	return {
		format: 'runrate-tariff-version',
		formatVersion: 1,
		meta: tariffMeta(tariff),
		version: {
			number: version.number,
			effectiveFrom: version.effectiveFrom,
			effectiveTo: version.effectiveTo,
			source: version.source,
			checkedOn: version.checkedOn,
			changeNote: version.changeNote,
			publishedBy: version.publishedByName,
			publishedAt: version.publishedAt.toISOString()
		},
		structure: version.structure
	};
}

/** Today's date in UTC, "YYYY-MM-DD": the day the tariff page's "in force" is judged on. */
export const todayIso = () => new Date().toISOString().slice(0, 10);

/**
 * The version the tariff page and the library price and describe: the one in force today, or, for a
 * tariff whose first version starts later, that first version (the page then says "from <date>").
 * Never simply the newest: a version published ahead of its date is not yet what anyone pays.
 */
export function versionForToday<V extends VersionRow>(
	versions: readonly V[],
	today = todayIso()
): V | undefined {
	return (
		versionInForce(versions, today) ??
		[...versions].sort((a, b) => a.effectiveFrom.localeCompare(b.effectiveFrom))[0]
	);
}

const referenceCache = new Map<string, number | null>();

/** The library's at-a-glance figure for a version (cached: published versions never change). */
export function typicalMonth(
	tariff: TariffRow,
	version: VersionRow | undefined,
	year = new Date().getUTCFullYear()
): number | null {
	if (!version) return null;
	const key = `${version.id}:${year}`;
	if (!referenceCache.has(key)) {
		try {
			referenceCache.set(
				key,
				referenceMonthlyCost(version.structure, tariff.timezone, tariff.holidays, year)
			);
		} catch {
			referenceCache.set(key, null);
		}
		if (referenceCache.size > 5000) referenceCache.delete(referenceCache.keys().next().value!);
	}
	return referenceCache.get(key) ?? null;
}

/** Which structures a version uses, for badges and filters. */
export function features(structure: VersionRow['structure']) {
	const types = new Set(structure.energyCharges?.map((c) => c.type) ?? []);
	return {
		tou: types.has('tou'),
		tiers: types.has('tiered'),
		demand: (structure.demandCharges?.length ?? 0) > 0,
		minimum: structure.minimumMonthly != null
	};
}
