import type { TariffInput } from '$lib/calc';

export type MetaDraft = {
	utility: string;
	name: string;
	code: string;
	country: string;
	region: string;
	area: string;
	customerClass: string;
	currency: string;
	timezone: string;
	holidayMode: 'country' | 'dates' | 'none';
	holidayRegion: string;
	holidayDates: string;
	description: string;
};
export type VersionDraft = {
	effectiveFrom: string;
	effectiveTo: string;
	source: string;
	checkedOn: string;
	changeNote: string;
};
export type Issue = { path: string; message: string };

type Holidays = { country: string; region?: string } | { dates: string[] } | null;

/**
 * The form's fields from a tariff's details. A new tariff starts empty (no country, zone or currency
 * that could pass for real figures); the fields show examples as placeholders instead. Holidays by
 * country use the tariff's own country, so the country is asked once.
 */
export function metaDraftFrom(meta: Partial<Record<string, unknown>> & { holidays?: Holidays }): MetaDraft {
	const h = meta.holidays ?? null;
	const text = (k: string) => (typeof meta[k] === 'string' ? (meta[k] as string) : '');
	return {
		utility: text('utility'),
		name: text('name'),
		code: text('code'),
		country: text('country'),
		region: text('region'),
		area: text('area'),
		customerClass: text('customerClass') || 'agricultural',
		currency: text('currency'),
		timezone: text('timezone'),
		holidayMode: !h ? 'none' : 'dates' in h ? 'dates' : 'country',
		holidayRegion: h && 'country' in h ? (h.region ?? '') : '',
		holidayDates: h && 'dates' in h ? h.dates.join('\n') : '',
		description: text('description')
	};
}

/**
 * The holidays the tariff prices like weekends, as saved: the tariff's country's calendar (the country
 * field is asked once, for both), its own list of dates, or none. The live preview prices with the same
 * value, so the preview and the tariff page agree.
 */
export function holidaysOf(meta: MetaDraft): Holidays {
	if (meta.holidayMode === 'none') return null;
	if (meta.holidayMode === 'dates') return { dates: meta.holidayDates.split(/[\s,]+/).filter(Boolean) };
	return {
		country: meta.country.trim().toUpperCase(),
		...(meta.holidayRegion.trim() ? { region: meta.holidayRegion } : {})
	};
}

/**
 * The JSON the editor posts: the same shape as the API and the JSON export (meta, version, structure).
 * The currency is asked once, with the charges; the tariff's details carry the same code.
 */
export function submission(
	meta: MetaDraft,
	version: VersionDraft,
	structure: TariffInput,
	expectedRevision?: number
) {
	const holidays = holidaysOf(meta);
	return {
		meta: {
			utility: meta.utility,
			name: meta.name,
			code: meta.code,
			country: meta.country,
			region: meta.region,
			area: meta.area,
			customerClass: meta.customerClass,
			currency: structure.currency,
			timezone: meta.timezone,
			holidays,
			description: meta.description
		},
		version: { ...version, effectiveTo: version.effectiveTo || null },
		structure,
		...(expectedRevision === undefined ? {} : { expectedRevision })
	};
}

/** Messages under a prefix ("meta.", "version.", "structure."), re-keyed without it. */
export function issuesUnder(issues: Issue[], prefix: string): Issue[] {
	return issues
		.filter((i) => i.path.startsWith(prefix))
		.map((i) => ({ ...i, path: i.path.slice(prefix.length) }));
}

const META_WORDS: Record<string, string> = {
	utility: 'Utility',
	name: 'Tariff name',
	code: 'Tariff code',
	country: 'Country',
	region: 'State or province',
	area: 'Area served',
	customerClass: 'Customer class',
	currency: 'Currency',
	timezone: 'Time zone',
	holidays: 'Public holidays',
	description: 'Description'
};
const VERSION_WORDS: Record<string, string> = {
	effectiveFrom: 'In force from',
	effectiveTo: 'In force until',
	source: 'Source',
	checkedOn: 'Checked against the source on',
	changeNote: 'What changed'
};

/**
 * The field of the tariff form a path points at, in words ("meta.holidays.country" → "Public holidays",
 * "version.source" → "Source", "structure.…" → "Charges"), or null when no field of the form shows it
 * (the whole form, or a path the form does not know): then the summary shows the message itself.
 */
export function formFieldWords(path: string): string | null {
	const [part, key] = path.split('.');
	// Holidays by country use the Country field, which shows the message.
	if (path.startsWith('meta.holidays.country')) return 'Country';
	if (part === 'meta') return (key && META_WORDS[key]) || null;
	if (part === 'version') return (key && VERSION_WORDS[key]) || null;
	if (part === 'structure') return 'Charges';
	return null;
}

/**
 * What the form's summary says: the fields that need attention, each named once in words (their
 * messages show at the fields), and the messages no field shows.
 */
export function formSummary(issues: Issue[]): { fields: string[]; messages: string[] } {
	const fields = new Set<string>();
	const messages = new Set<string>();
	for (const issue of issues) {
		const words = formFieldWords(issue.path);
		if (words) fields.add(words);
		else messages.add(issue.message);
	}
	return { fields: [...fields], messages: [...messages] };
}

/**
 * The field a refusal of the live preview's calculation points at, in words: the preview names it
 * instead of repeating the message, which the field itself shows once the form is saved.
 */
export function previewFieldWords(path: string): string | null {
	const [part] = path.split('.');
	if (part === 'timezone') return 'Time zone';
	if (path.startsWith('holidays.country')) return 'Country';
	if (part === 'holidays') return 'Public holidays';
	if (part === 'tariff') return 'Charges';
	return null;
}

/** Reads an uploaded export (our documented JSON shape) into drafts; returns a message when it is not one. */
export function readExport(
	text: string
): { meta: MetaDraft; version: VersionDraft; structure: TariffInput } | string {
	let data: unknown;
	try {
		data = JSON.parse(text);
	} catch {
		return 'That file is not valid JSON.';
	}
	const d = data as {
		format?: string;
		meta?: Record<string, unknown>;
		version?: Record<string, string>;
		structure?: TariffInput;
	};
	if (!d || typeof d !== 'object' || d.format !== 'runrate-tariff-version' || !d.meta || !d.structure)
		return 'That file is not a Runrate tariff version (its "format" should be "runrate-tariff-version").';
	return {
		meta: metaDraftFrom(d.meta as Parameters<typeof metaDraftFrom>[0]),
		version: {
			effectiveFrom: d.version?.effectiveFrom ?? '',
			effectiveTo: d.version?.effectiveTo ?? '',
			source: d.version?.source ?? '',
			checkedOn: d.version?.checkedOn ?? '',
			changeNote: d.version?.changeNote ?? ''
		},
		structure: d.structure
	};
}
