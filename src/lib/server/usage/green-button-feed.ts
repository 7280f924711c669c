/**
 * The shape of a Green Button (ESPI) download once fast-xml-parser has read it: an Atom feed whose
 * entries each hold one resource — UsagePoint, MeterReading, ReadingType, IntervalBlock… — tied
 * together by Atom links. This module finds the interval blocks and the ReadingType that gives each
 * block its unit; it checks no values.
 */

export type XmlNode = Record<string, unknown>;

export const isNode = (value: unknown): value is XmlNode =>
	typeof value === 'object' && value !== null && !Array.isArray(value);

const asList = (value: unknown): unknown[] =>
	value === undefined ? [] : Array.isArray(value) ? value : [value];

/** An element's text: the parser gives a bare string, or `#text` beside the element's attributes. */
export function textOf(value: unknown): string | undefined {
	if (typeof value === 'string') return value;
	if (isNode(value) && typeof value['#text'] === 'string') return value['#text'];
	return undefined;
}

/** The ReadingType fields the import needs, as written (ESPI codes are numbers in text). */
export type ReadingKind = {
	uom?: string;
	powerOfTenMultiplier?: string;
	intervalLength?: string;
	flowDirection?: string;
	accumulationBehaviour?: string;
};

export type ReadingBlock = { kind: ReadingKind; readings: XmlNode[] };

type Links = { self?: string; up?: string; related: string[] };

function linksOf(entry: XmlNode): Links {
	const links: Links = { related: [] };
	for (const link of asList(entry.link)) {
		if (!isNode(link) || typeof link['@_href'] !== 'string') continue;
		const href = link['@_href'];
		if (link['@_rel'] === 'self') links.self = href;
		else if (link['@_rel'] === 'up') links.up = href;
		else if (link['@_rel'] === 'related') links.related.push(href);
	}
	return links;
}

function kindOf(node: XmlNode): ReadingKind {
	const field = (name: keyof ReadingKind) => textOf(node[name]);
	return {
		uom: field('uom'),
		powerOfTenMultiplier: field('powerOfTenMultiplier'),
		intervalLength: field('intervalLength'),
		flowDirection: field('flowDirection'),
		accumulationBehaviour: field('accumulationBehaviour')
	};
}

/**
 * Every IntervalBlock of the feed with the ReadingType it belongs to. With one ReadingType in the
 * file (the usual "download my data" of one meter) it applies to every block; with several, each
 * block follows its links: block —up→ …/MeterReading/n/IntervalBlock, MeterReading —related→
 * ReadingType, as the ESPI standard ties them.
 */
export function readingBlocks(feed: XmlNode): { blocks: ReadingBlock[] } | { error: string } {
	const kindsByHref = new Map<string, ReadingKind>();
	const kinds: ReadingKind[] = [];
	const meterReadings = new Map<string, string[]>();
	const found: { up?: string; readings: XmlNode[] }[] = [];
	for (const entry of asList(feed.entry)) {
		if (!isNode(entry) || !isNode(entry.content)) continue;
		const links = linksOf(entry);
		const content = entry.content;
		if (isNode(content.ReadingType)) {
			const kind = kindOf(content.ReadingType);
			kinds.push(kind);
			if (links.self) kindsByHref.set(links.self, kind);
		}
		if ('MeterReading' in content && links.self) meterReadings.set(links.self, links.related);
		for (const block of asList(content.IntervalBlock)) {
			if (!isNode(block)) continue;
			found.push({ up: links.up, readings: asList(block.IntervalReading).filter(isNode) });
		}
	}
	if (found.every((block) => block.readings.length === 0))
		return { error: 'The file holds no interval readings: there is nothing to import.' };
	if (kinds.length === 0)
		return { error: 'The file has no ReadingType, so the unit of its readings is unknown.' };

	const blocks: ReadingBlock[] = [];
	for (const { up, readings } of found) {
		const meter = up?.replace(/\/IntervalBlock\/?$/, '');
		const kind =
			kinds.length === 1
				? kinds[0]
				: meterReadings
						.get(meter ?? '')
						?.map((href) => kindsByHref.get(href))
						.find((k) => k !== undefined);
		if (!kind)
			return {
				error:
					`The file holds ${kinds.length} kinds of reading and its links do not say which readings are ` +
					'which. Download the energy use of one meter alone.'
			};
		blocks.push({ kind, readings });
	}
	return { blocks };
}
