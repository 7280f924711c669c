import { loadComparison } from './load-comparison';
import type { PageLoad } from './$types';

/** The figures come from GET /api/v1/compare — fetched by the browser as the choices change. */
export const load = ((event) => loadComparison(event)) satisfies PageLoad;
