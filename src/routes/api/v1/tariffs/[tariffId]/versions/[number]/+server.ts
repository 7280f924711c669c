import { error, json } from '@sveltejs/kit';
import { requireTariffRead } from '$lib/server/guard';
import { exportVersion } from '$lib/server/tariffs/submission';
import type { RequestHandler } from './$types';

/** GET …/versions/:number — one version in Runrate's documented JSON shape, as a download. */
export const GET: RequestHandler = async (event) => {
	const { tariff, versions } = await requireTariffRead(event, event.params.tariffId);
	const version = versions.find((v) => String(v.number) === event.params.number);
	if (!version) error(404, 'Not found');
	const fileName = `${tariff.utility}-${tariff.name}-v${version.number}`
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '')
		.slice(0, 100);
	return json(exportVersion(tariff, version), {
		headers: {
			'Content-Disposition': `attachment; filename="${fileName}.json"`,
			'Cache-Control': 'private, no-store'
		}
	});
};
