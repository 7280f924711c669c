import { error, type RequestEvent } from '@sveltejs/kit';
import { tariffSchema, versionInForce, type DatedTariff } from '$lib/calc';
import { requireTariffRead } from '../guard';

/**
 * A calculation request may name a library tariff (`tariffId`, optionally `tariffVersion` to pin one)
 * instead of carrying it inline; that needs a session. Returns the versions to calculate with, and the
 * body with an inline tariff so the usual validation runs on everything else.
 */
export async function resolveTariffId(
	event: RequestEvent,
	body: Record<string, unknown>
): Promise<{ body: Record<string, unknown>; versions: DatedTariff[] }> {
	if (!event.locals.user)
		error(401, 'Sign in to calculate with a library tariff by id, or send the tariff inline.');
	const { tariffId, tariffVersion, ...rest } = body;
	const { tariff, versions } = await requireTariffRead(event, String(tariffId));
	const chosen = tariffVersion === undefined ? versions : versions.filter((v) => v.number === tariffVersion);
	if (chosen.length === 0) error(404, `This tariff has no version ${String(tariffVersion)}.`);
	const dated = chosen.map((v) => ({
		id: v.id,
		number: v.number,
		// A pinned version applies to every period, whatever its dates.
		effectiveFrom: tariffVersion === undefined ? v.effectiveFrom : '0000-01-01',
		effectiveTo: tariffVersion === undefined ? v.effectiveTo : null,
		tariff: tariffSchema.parse(v.structure)
	}));
	// Inline the version in force when the request starts (compare prices its whole year on it).
	const period = rest.period as { start?: unknown; billingPeriods?: { from?: unknown }[] } | undefined;
	const firstDay =
		typeof period?.start === 'string'
			? `${period.start}-01`
			: String(period?.billingPeriods?.[0]?.from ?? '');
	const inline = versionInForce(dated, firstDay) ?? dated.at(-1)!;
	return {
		body: {
			timezone: tariff.timezone,
			holidays: tariff.holidays,
			...rest,
			tariff: chosen.find((v) => v.id === inline.id)!.structure
		},
		versions: dated
	};
}
