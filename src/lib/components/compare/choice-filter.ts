// The compare chooser's list as the page holds it, and its search (no runes here: the server's `?find=`
// and the typing in the browser filter the same way, so a page without scripts lists what one with them does).

/** One live scenario the person may compare. */
export type ChoiceScenario = { id: string; name: string; isBaseline: boolean };

/** A site and its live scenarios, in the order the chooser lists them. */
export type ChoiceSite = { id: string; name: string; scenarios: ChoiceScenario[] };

/** A picked scenario with its site's name: what the "Picked" list and the baseline menu show. */
export type PickedChoice = ChoiceScenario & { siteName: string };

/** One row of the scenarios a person may read, with its site (`readableScenarios`). */
export type ChoiceRow = ChoiceScenario & { siteId: string; siteName: string };

/**
 * Rows grouped by site, in the order each site first appears. By id, not by neighbours: two sites may
 * share a name, and their rows then interleave in a list sorted by name.
 */
export function bySite(rows: ChoiceRow[]): ChoiceSite[] {
	const sites = new Map<string, ChoiceSite>();
	for (const row of rows) {
		const scenario = { id: row.id, name: row.name, isBaseline: row.isBaseline };
		const site = sites.get(row.siteId);
		if (site) site.scenarios.push(scenario);
		else sites.set(row.siteId, { id: row.siteId, name: row.siteName, scenarios: [scenario] });
	}
	return [...sites.values()];
}

/** The sites listed at once; "Show more" adds as many again. Up to this many sites, all are listed. */
export const SITES_AT_ONCE = 20;

/** What a search may hold: longer text is cut (a search box, not a place to paste a page). */
export const FIND_MAX = 100;

/** The words of a text, lower case with accents folded (so "Rivière" is found by "riviere"). */
export function wordsOf(text: string): string[] {
	return text
		.normalize('NFD')
		.replace(/\p{M}/gu, '')
		.toLowerCase()
		.split(/[^\p{L}\p{N}]+/u)
		.filter(Boolean);
}

/** The words of a search; none for an empty one. */
export const searchWords = (find: string): string[] => wordsOf(find.slice(0, FIND_MAX));

/**
 * The sites that answer a search, each with the scenarios that do: a scenario answers when every word
 * typed begins a word of its site's name or its own ("alder pump" finds the Alder Creek site's pump
 * scenarios; "led" finds "LED lights", not "Installed"). An empty search keeps every site.
 */
export function findChoices(sites: ChoiceSite[], find: string): ChoiceSite[] {
	const words = searchWords(find);
	if (words.length === 0) return sites;
	const found: ChoiceSite[] = [];
	for (const site of sites) {
		const siteWords = wordsOf(site.name);
		const scenarios = site.scenarios.filter((s) => {
			const text = [...siteWords, ...wordsOf(s.name)];
			return words.every((word) => text.some((w) => w.startsWith(word)));
		});
		if (scenarios.length) found.push({ ...site, scenarios });
	}
	return found;
}

/** The picked scenarios in the order they were picked, with their sites' names; unknown ids are left out. */
export function pickedChoices(sites: ChoiceSite[], ids: string[]): PickedChoice[] {
	const byId = new Map<string, PickedChoice>();
	for (const site of sites) for (const s of site.scenarios) byId.set(s.id, { ...s, siteName: site.name });
	// Once each: an address may name a scenario twice, and the lists are keyed by id.
	return [...new Set(ids)].flatMap((id) => byId.get(id) ?? []);
}

/** How many sites to list: all up to SITES_AT_ONCE; past that, `shown` (a whole number of steps). */
export function sitesShown(found: number, shown: number): number {
	const steps = Number.isFinite(shown) ? Math.max(1, Math.ceil(shown / SITES_AT_ONCE)) : 1;
	return Math.min(found, steps * SITES_AT_ONCE);
}

const plural = (n: number, one: string, many: string) =>
	`${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;

/** What the live region says about a search; nothing when there is none. */
export function foundWords(find: string, found: ChoiceSite[]): string {
	const typed = find.trim().slice(0, FIND_MAX);
	if (!typed) return '';
	if (found.length === 0) return `No site or scenario matches “${typed}”.`;
	const scenarios = found.reduce((n, site) => n + site.scenarios.length, 0);
	const verb = scenarios === 1 ? 'matches' : 'match';
	return `${plural(scenarios, 'scenario', 'scenarios')} at ${plural(found.length, 'site', 'sites')} ${verb} “${typed}”.`;
}

/** The chooser's list as sent: sites with their scenarios, and how many readable ones were left out. */
export interface PickerChoices {
	sites: ChoiceSite[];
	/** Scenarios not sent (past the bound): a search on the server (`?find=`) reaches them. */
	left: number;
}

/**
 * At most `limit` scenarios, whole sites in their order: all of them when they fit; past that, the sites
 * of the picked scenarios first (so their names show), then those that answer `find`, then the rest.
 */
export function boundChoices(
	sites: ChoiceSite[],
	{ find, picked }: { find: string; picked: string[] },
	limit: number
): PickerChoices {
	const total = sites.reduce((n, s) => n + s.scenarios.length, 0);
	if (total <= limit) return { sites, left: 0 };
	const found = new Set(findChoices(sites, find).map((s) => s.id));
	// A comparison holds a handful; an address with hundreds of ids still sends a bounded list.
	const wanted = new Set(picked.slice(0, 20));
	const holdsPicked = (site: ChoiceSite) => site.scenarios.some((s) => wanted.has(s.id));
	const sent = new Set<string>();
	let count = 0;
	for (const rank of [holdsPicked, (s: ChoiceSite) => found.has(s.id), () => true])
		for (const site of sites) {
			if (sent.has(site.id) || !rank(site)) continue;
			if (count + site.scenarios.length > limit && !holdsPicked(site)) continue;
			sent.add(site.id);
			count += site.scenarios.length;
		}
	return { sites: sites.filter((s) => sent.has(s.id)), left: total - count };
}
