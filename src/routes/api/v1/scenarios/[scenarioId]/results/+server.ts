import { json } from '@sveltejs/kit';
import { parseRequest } from '$lib/calc';
import { apiError } from '$lib/server/http/json';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess } from '$lib/server/guard';
import { priceScenario } from '$lib/server/sites/results.service';
import { storedPrice } from '$lib/server/sites/stored-results';
import { previewSchema } from '$lib/server/sites/device-specs';
import type { RequestHandler } from './$types';
import { invalid } from '$lib/server/http/answers';

const yearPeriod = () => ({ start: `${new Date().getUTCFullYear()}-01`, months: 12 });

function answer(priced: Awaited<ReturnType<typeof priceScenario>>) {
	if (priced.ok)
		return json(
			{ ...priced.result, tariff: priced.tariff, note: priced.note },
			{ headers: { 'Cache-Control': 'private, no-store' } }
		);
	if (priced.invalid) return json({ ...priced.invalid, message: priced.message }, { status: 400 });
	const code = { 'no-tariff': 'no_tariff', unavailable: 'tariff_unavailable', invalid: 'not_priceable' };
	return apiError(409, code[priced.reason], priced.message);
}

/** GET — the calculation response for the stored scenario over the 12 months of this year (a stored result). */
export const GET: RequestHandler = async (event) => {
	const { site, scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	return answer(await storedPrice(site, scenario, yearPeriod()));
};

/** POST `{ devices }` — the same, for an edited list not yet saved (the page's live results). */
export const POST: RequestHandler = async (event) => {
	const { site, scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(previewSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	return answer(await priceScenario(site, scenario, parsed.data.devices, yearPeriod()));
};
