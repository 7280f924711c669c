import { readJsonBody } from '$lib/server/http/body';
import { apiError, jsonBody, NO_STORE } from '$lib/server/http/json';
import { overCalculationBudget } from '$lib/server/http/rate-limits';
import { MAX_URDB_BYTES, readUrdbRate, REFUSED } from '$lib/server/tariffs/urdb-read';
import { dateOf } from '$lib/server/tariffs/urdb-provenance';
import type { RequestHandler } from './$types';

/**
 * POST /api/v1/tariffs/from-urdb — one rate of the open rate database (a rate object, or the database
 * API's `{ "items": [ rate ] }`) as a Runrate tariff, with notes on what it could not take. Anonymous
 * callers allowed, on the calculation API's budget; the body may be 2 MB. Nothing is stored.
 */
export const POST: RequestHandler = async (event) => {
	const limited = await overCalculationBudget(event);
	if (limited) return limited;
	const read = await readJsonBody(event, MAX_URDB_BYTES);
	if (!read.ok) return read.response;
	const reading = readUrdbRate(read.body);
	if (reading.kind === 'unreadable')
		return apiError(422, 'invalid_rate', reading.message, reading.issues.length ? reading.issues : undefined);
	if (reading.kind === 'refused')
		return jsonBody(
			{ error: 'cannot_price', message: REFUSED, notes: reading.notes },
			{ status: 422, headers: NO_STORE }
		);
	const { tariff, meta, notes, rate } = reading;
	// The database's dates as calendar dates (see dateOf); the import's own, when it gives them, win.
	const dates = { startDate: dateOf(rate.startdate), endDate: dateOf(rate.enddate) };
	return jsonBody({ tariff, meta: { ...dates, ...meta }, notes }, { headers: NO_STORE });
};
