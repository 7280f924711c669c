import type { LibraryFilters } from './library-search.svelte';

/** Below Tailwind's `sm` breakpoint (640 px) the page is laid out for a phone. */
export const PHONE_QUERY = '(max-width: 639.98px)';

/** How many of the library's filters narrow the list (the sort order is not a filter). */
export function activeFilterCount(filters: LibraryFilters): number {
	const { q, country, region, customerClass, feature, scope } = filters;
	return [q, country, region, customerClass, feature, scope].filter((value) => value.trim() !== '').length;
}
