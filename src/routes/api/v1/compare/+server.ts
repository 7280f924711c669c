import { compare, compareRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/api';
import type { RequestHandler } from './$types';

/** POST /api/v1/compare — scenarios over 12 calendar months, with finance and CO₂. */
export const POST: RequestHandler = (event) => calculationEndpoint(event, compareRequestSchema, compare);
