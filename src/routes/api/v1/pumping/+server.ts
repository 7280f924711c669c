import { pumping, pumpingRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import type { RequestHandler } from './$types';

/** POST /api/v1/pumping — water-pump input power and air-injection pressure. */
export const POST: RequestHandler = (event) => calculationEndpoint(event, pumpingRequestSchema, pumping);
