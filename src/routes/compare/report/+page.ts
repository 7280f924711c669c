import { loadComparison } from '../load-comparison';
import type { PageLoad } from './$types';

/** The same figures as the compare page, from GET /api/v1/compare, laid out for print. */
export const load = ((event) => loadComparison(event)) satisfies PageLoad;
