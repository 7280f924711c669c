// The shape every calculation endpoint shares.
import { isHttpError, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import { NoVersionInForce, parseRequest } from '$lib/calc';
import { logger } from '../log';
import { readJsonBody } from './body';
import { apiError, jsonBody, NO_STORE } from './json';
import { overCalculationBudget } from './rate-limits';
import { invalid } from './answers';

/**
 * The shape every calculation endpoint shares: rate limit, bounded JSON body, zod validation with
 * field paths (400), then `run` (which may first read a library tariff), then the pure core. The core
 * never sees unvalidated input.
 */
export async function calculationEndpoint<S extends z.ZodType, R>(
	event: RequestEvent,
	schema: S,
	run: (input: z.output<S>) => R | Promise<R>
) {
	const limited = await overCalculationBudget(event);
	if (limited) return limited;
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(schema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	try {
		return jsonBody(await run(parsed.data), { headers: NO_STORE });
	} catch (error) {
		// A library tariff the caller may not use (401, 404) is answered as SvelteKit answers any such error.
		if (isHttpError(error)) throw error;
		if (error instanceof NoVersionInForce)
			return apiError(400, 'invalid_request', error.message, [{ path: 'period', message: error.message }]);
		// Validation should make this unreachable; if it is reached, answer in the API's own terms and log it.
		logger.error({ err: error, path: event.url.pathname }, 'calculation failed on validated input');
		return apiError(422, 'calculation_failed', 'This request passed validation but could not be calculated.');
	}
}
