/** The library's query string: empty filters are left out, page 1 is the default. */
export function libraryQuery(filters: Record<string, string>, page: number): string {
	const params = new URLSearchParams(Object.entries(filters).filter(([, v]) => v));
	if (page > 1) params.set('page', String(page));
	return params.toString();
}
