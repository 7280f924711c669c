import { calculateRequestSchema, parseRequest } from '$lib/calc';
import type { toRequest } from './quick-estimate';

// The core's request schema (with zod and Luxon) is most of the home page's JavaScript: the page loads
// this module only after it is up (quick-estimate.svelte.ts), so it answers input sooner on a slow phone.

export type Issue = { path: string; message: string };

/**
 * The problems the calculation API would answer for this request, found in the browser with the core's
 * own schema, so an entry that cannot be priced is shown at its field and never sent (no 400).
 */
export function requestIssues(request: ReturnType<typeof toRequest>): Issue[] {
	const parsed = parseRequest(calculateRequestSchema, request);
	return parsed.success ? [] : parsed.error.issues;
}
