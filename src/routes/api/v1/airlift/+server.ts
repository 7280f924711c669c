import { airlift, airliftInputFrom, airliftRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import type { RequestHandler } from './$types';

/** POST /api/v1/airlift — the air an air-lift needs for a water flow, or the water an air flow lifts. */
export const POST: RequestHandler = (event) =>
	calculationEndpoint(event, airliftRequestSchema, (request) => airlift(airliftInputFrom(request)));
