// The tariff of a calculation request: carried inline, or named from the library by id (with a session).
import { error, type RequestEvent } from '@sveltejs/kit';
import {
	holidaysSchema,
	tariffSchema,
	timezoneSchema,
	versionInForce,
	type DatedTariff,
	type Tariff
} from '$lib/calc';
import { requireTariffRead } from '../guard';

/** An inline tariff as the one version there is: in force on every day. */
const openEnded = (tariff: Tariff): DatedTariff => ({
	id: 'inline',
	number: 1,
	effectiveFrom: '0000-01-01',
	effectiveTo: null,
	tariff
});

/** The first day a request's period covers. */
const firstDayOf = (period: { start: string } | { billingPeriods: { from: string }[] }) =>
	'start' in period ? `${period.start}-01` : (period.billingPeriods[0]?.from ?? '');

/**
 * The library versions a request names, read with the caller's access (401 without a session, 404 for
 * a tariff the caller may not read or a version it does not have). A pinned version applies to every
 * period, whatever its dates.
 */
async function libraryVersions(event: RequestEvent, tariffId: string, pinned: number | undefined) {
	if (!event.locals.user)
		error(401, 'Sign in to calculate with a library tariff by id, or send the tariff inline.');
	const { tariff, versions } = await requireTariffRead(event, tariffId);
	const chosen = pinned === undefined ? versions : versions.filter((v) => v.number === pinned);
	if (chosen.length === 0) error(404, `This tariff has no version ${String(pinned)}.`);
	const dated: DatedTariff[] = chosen.map((v) => ({
		id: v.id,
		number: v.number,
		effectiveFrom: pinned === undefined ? v.effectiveFrom : '0000-01-01',
		effectiveTo: pinned === undefined ? v.effectiveTo : null,
		tariff: tariffSchema.parse(v.structure)
	}));
	return { tariff, versions: dated };
}

/**
 * A validated body as the core's request and the tariff versions to calculate with. An inline tariff is
 * one open-ended version; a library tariff brings its versions, its time zone and holidays (unless the
 * body gives them), and the version in force on the period's first day as the request's own tariff.
 */
export async function requestWithVersions<
	T extends {
		period: { start: string } | { billingPeriods: { from: string }[] };
		tariff: Tariff;
		timezone: string;
		holidays: unknown;
	}
>(
	event: RequestEvent,
	body:
		| { inline: T }
		| {
				library: Omit<T, 'tariff' | 'timezone' | 'holidays'> & {
					timezone?: T['timezone'];
					holidays?: T['holidays'];
					tariffId: string;
					tariffVersion?: number;
				};
		  }
): Promise<{ request: T; versions: DatedTariff[]; inline: boolean }> {
	if ('inline' in body)
		return { request: body.inline, versions: [openEnded(body.inline.tariff)], inline: true };
	const { tariffId, tariffVersion, ...fields } = body.library;
	const { tariff, versions } = await libraryVersions(event, tariffId, tariffVersion);
	const inForce = versionInForce(versions, firstDayOf(fields.period)) ?? versions.at(-1)!;
	const request = {
		...fields,
		timezone: fields.timezone === undefined ? timezoneSchema.parse(tariff.timezone) : fields.timezone,
		holidays: fields.holidays === undefined ? holidaysSchema.parse(tariff.holidays) : fields.holidays,
		tariff: inForce.tariff
	} as unknown as T;
	return { request, versions, inline: false };
}
