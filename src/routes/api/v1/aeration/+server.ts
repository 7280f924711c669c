import { aeration, aerationInputFrom, aerationRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import type { RequestHandler } from './$types';

/** POST /api/v1/aeration — the air and watts that hold a target dissolved oxygen against a demand. */
export const POST: RequestHandler = (event) =>
	calculationEndpoint(event, aerationRequestSchema, (request) => aeration(aerationInputFrom(request)));
