// The site form's tariff choices as the page holds them, and the words of a search's answer (no runes here).

/** One tariff a site or scenario may be billed on, as the form offers it. */
export type TariffChoice = {
	id: string;
	label: string;
	currency: string;
	versions: { number: number; effectiveFrom: string }[];
};

/** The groups the server renders: own tariffs in full, the public ones its search found. */
export type TariffChoices = {
	own: { label: string; choices: TariffChoice[] };
	public: { label: string; choices: TariffChoice[] };
	search: string;
	found: number;
};

/** The public tariffs that answer one search, and how many match in all. */
export type PublicFound = { search: string; found: number; choices: TariffChoice[] };

/** At most this many public tariffs answer one search, on the page and through the API alike. */
export const PUBLIC_CHOICES = 50;

/** A tariff of GET /api/v1/tariffs, the fields the form uses. */
export type LibraryItem = {
	id: string;
	utility: string;
	name: string;
	currency: string;
	versions: { number: number; effectiveFrom: string }[];
};

/** The query of GET /api/v1/tariffs for a search of the public library: 50 at most, by utility. */
export function tariffSearchQuery(search: string): string {
	const params: [string, string][] = [
		['scope', 'public'],
		['sort', 'utility'],
		['pageSize', String(PUBLIC_CHOICES)]
	];
	if (search) params.push(['q', search]);
	return params.map(([key, value]) => `${key}=${encodeURIComponent(value)}`).join('&');
}

/** What the polite live region says of a search: "3 tariffs found", and when only the first 50 are listed. */
export function foundWords(found: PublicFound): string {
	const what = found.search ? `for “${found.search}”` : 'in the public library';
	if (found.found === 0) return `No public tariff found ${what}.`;
	const count = `${found.found} public ${found.found === 1 ? 'tariff' : 'tariffs'} found ${what}`;
	return found.found > PUBLIC_CHOICES
		? `${count}; the first ${PUBLIC_CHOICES} are listed. Add words to narrow it.`
		: `${count}.`;
}

/**
 * The public group to show: the tariffs last found, with the one chosen in front when the search left it
 * out (so a new search never drops the choice made).
 */
export function keptChoice(
	groups: TariffChoices | null,
	found: TariffChoice[],
	chosenId: string
): TariffChoice[] {
	if (!chosenId || found.some((c) => c.id === chosenId)) return found;
	if (groups?.own.choices.some((c) => c.id === chosenId)) return found;
	const kept = groups?.public.choices.find((c) => c.id === chosenId);
	return kept ? [kept, ...found] : found;
}
