// The one rule for which tariff a site may use, asked where a tariff is chosen and again where it is used.
import { eq, inArray, sql } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { tariffs, tariffVersions } from '$lib/server/db/schema';
import { findTariff, withVersions, type TariffRow } from '$lib/server/tariffs/tariff.service';

/** What pricing, comparisons and exports say instead of anything about a tariff the site may not use. */
export const TARIFF_UNAVAILABLE = "This site's tariff is not available to this workspace";

/**
 * The same words for a malformed id (the schemas say this too), an unknown one and someone else's private
 * tariff, so no answer tells which ids exist.
 */
export const PICK_A_TARIFF = 'Pick a tariff from the library';

/**
 * Whether the sites of `workspaceId` may price on this tariff: the public library, or that workspace's own
 * private tariffs. Asked by every path that uses a stored tariff id, not only by the forms that choose one,
 * so a tariff id that got in by any route never shows another workspace's tariff.
 */
export const tariffUsableBy = (workspaceId: string, tariff: Pick<TariffRow, 'workspaceId'>) =>
	tariff.workspaceId === null || tariff.workspaceId === workspaceId;

/**
 * Who chooses a tariff for a site or scenario. A member of the site's workspace may choose any tariff the
 * site may use; a guest of one site (a `site_grant`) does not see the workspace's private tariffs, so may
 * choose only public ones and the tariffs already chosen (`keep`: the site's, and the scenario's own).
 */
export type TariffChooser = { workspaceId: string; guestKeeps?: readonly (string | null)[] };

/** The chooser for a caller of `requireSiteAccess` (`viaGrant` marks the guest). */
export const chooserFor = (
	access: { site: { workspaceId: string; tariffId: string | null }; viaGrant: boolean },
	scenario?: { tariffId: string | null }
): TariffChooser => ({
	workspaceId: access.site.workspaceId,
	guestKeeps: access.viaGrant ? [access.site.tariffId, scenario?.tariffId ?? null] : undefined
});

/** Whether this chooser may choose the tariff (the rule `tariffChoiceProblem` and the form's list share). */
export const mayChoose = (chooser: TariffChooser, tariff: Pick<TariffRow, 'id' | 'workspaceId'>) =>
	tariffUsableBy(chooser.workspaceId, tariff) &&
	(!chooser.guestKeeps || tariff.workspaceId === null || chooser.guestKeeps.includes(tariff.id));

/** A tariff with its versions if the site of `workspaceId` may use it; null when it is unknown or not theirs. */
export async function usableTariff(workspaceId: string, tariffId: string) {
	const found = await findTariff(tariffId);
	return found && tariffUsableBy(workspaceId, found.tariff) ? found : null;
}

export type TariffChoiceIssue = { field: 'tariffId' | 'tariffVersion'; message: string };

/**
 * Checks a tariff chosen for a site or scenario: one the chooser may choose, and a pinned version that
 * exists. Returns the field to mark and the message, or null when the choice is fine.
 */
export async function tariffChoiceProblem(
	chooser: TariffChooser,
	choice: { tariffId: string | null; tariffVersion: number | null }
): Promise<TariffChoiceIssue | null> {
	if (!choice.tariffId)
		return choice.tariffVersion === null
			? null
			: { field: 'tariffVersion', message: 'Pin a version only together with a tariff' };
	const found = await findTariff(choice.tariffId);
	if (!found || !mayChoose(chooser, found.tariff)) return { field: 'tariffId', message: PICK_A_TARIFF };
	if (choice.tariffVersion !== null && !found.versions.some((v) => v.number === choice.tariffVersion))
		return { field: 'tariffVersion', message: `That tariff has no version ${choice.tariffVersion}` };
	return null;
}

/**
 * The tariffs of `ids` with their versions that sites of `workspaceId` may use, by id, in two queries
 * however many there are (a list of sites prices on them all).
 */
export async function usableTariffs(workspaceId: string, ids: string[]) {
	const unique = [...new Set(ids)];
	const rows = unique.length ? await db.select().from(tariffs).where(inArray(tariffs.id, unique)) : [];
	const found = await withVersions(rows.filter((row) => tariffUsableBy(workspaceId, row)));
	return new Map(found.map((entry) => [entry.tariff.id, entry]));
}

// Built once, with the ids as one array parameter, so any number of tariffs is the same statement.
const tariffKeysQuery = db
	.select({
		tariff: tariffs,
		version: {
			id: tariffVersions.id,
			number: tariffVersions.number,
			effectiveFrom: tariffVersions.effectiveFrom,
			effectiveTo: tariffVersions.effectiveTo
		}
	})
	.from(tariffs)
	.leftJoin(tariffVersions, eq(tariffVersions.tariffId, tariffs.id))
	.where(sql`${tariffs.id} = any(${sql.placeholder('ids')}::uuid[])`)
	.prepare('usable_tariff_keys');

/**
 * As `usableTariffs`, with each version's number and dates but not its rates: all a stored result's key
 * needs, so a list read from stored results never loads the rates. One query.
 */
export async function usableTariffKeys(workspaceId: string, ids: string[]) {
	const unique = [...new Set(ids)];
	const rows = unique.length ? await tariffKeysQuery.execute({ ids: unique }) : [];
	const found = new Map<
		string,
		{ tariff: TariffRow; versions: NonNullable<(typeof rows)[number]['version']>[] }
	>();
	for (const { tariff, version } of rows) {
		if (!tariffUsableBy(workspaceId, tariff)) continue;
		const entry = found.get(tariff.id) ?? { tariff, versions: [] };
		if (version) entry.versions.push(version);
		found.set(tariff.id, entry);
	}
	return found;
}
