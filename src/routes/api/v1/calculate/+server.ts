import { calculate, calculateRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/api';
import type { RequestHandler } from './$types';

/** POST /api/v1/calculate — the calculation contract (see /rules). Anonymous requests are rate limited. */
export const POST: RequestHandler = (event) => calculationEndpoint(event, calculateRequestSchema, calculate);
