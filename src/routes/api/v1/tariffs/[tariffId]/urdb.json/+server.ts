import { json } from '@sveltejs/kit';
import { tariffSchema, urdbFromTariff } from '$lib/calc';
import { invalid, notFound } from '$lib/server/http/answers';
import { requireTariffRead } from '$lib/server/guard';
import { versionForToday } from '$lib/server/tariffs/submission';
import type { RequestHandler } from './$types';

/**
 * GET /api/v1/tariffs/:id/urdb.json[?version=N] — a version (the one in force today, or N) in the open
 * rate database's JSON shape, as a download. The body is shaped as that database's API answers,
 * `{ items: [rate] }`, so anything that reads its answers reads this one; beside `items`, `notWritten`
 * lists what of the tariff that shape cannot hold (riders, taxes, holidays, …) as `{ field, message }`.
 * Access as the other tariff routes: public tariffs to all, private ones to their workspace (else 404).
 */
export const GET: RequestHandler = async (event) => {
	const { tariff, versions } = await requireTariffRead(event, event.params.tariffId);
	const asked = event.url.searchParams.get('version');
	if (asked !== null && !/^[1-9]\d{0,5}$/.test(asked))
		return invalid([{ path: 'version', message: 'Version must be a whole number from 1' }]);
	const version =
		asked === null ? versionForToday(versions) : versions.find((v) => v.number === Number(asked));
	if (!version)
		return notFound(asked === null ? 'This tariff has no version' : `This tariff has no version ${asked}`);
	const { rate, notes } = urdbFromTariff(tariffSchema.parse(version.structure), {
		label: tariff.urdbLabel,
		utility: tariff.utility,
		name: tariff.name,
		source: version.source,
		startDate: version.effectiveFrom,
		endDate: version.effectiveTo
	});
	const fileName = `${tariff.utility}-${tariff.name}-v${version.number}-urdb`
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '')
		.slice(0, 100);
	return json(
		{ items: [rate], notWritten: notes },
		{
			headers: {
				'Content-Disposition': `attachment; filename="${fileName}.json"`,
				'Cache-Control': 'private, no-store'
			}
		}
	);
};
