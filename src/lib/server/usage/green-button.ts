import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { DECLARES_ENTITIES } from './declarations';
import { isNode, readingBlocks, textOf, type ReadingBlock, type ReadingKind } from './green-button-feed';
import {
	MAX_INTERVAL_SECONDS,
	MAX_INTERVALS,
	readingTime,
	sortedWithoutOverlap,
	type Interval,
	type UsageRead
} from './interval';

// ESPI codes (NAESB REQ.21 espi.xsd: UnitSymbolKind, FlowDirectionKind, AccumulationKind).
const WATT_HOURS = '72';
const FORWARD = '1';
/** Register readings (bulkQuantity, cumulative) are running meter totals, not the use of an interval. */
const REGISTER_TOTALS = new Set(['1', '3']);

const INTEGER = /^[+-]?\d+$/;
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)$/;
// An XML bomb needs a DOCTYPE to declare its entities; Green Button files never carry one.
const DECLARATION = /<!(DOCTYPE|ENTITY)/i;
const READING_END = /<\/(?:[\w.-]+:)?IntervalReading\s*>/g;

const parser = new XMLParser({
	removeNSPrefix: true,
	ignoreAttributes: false,
	// Never expand entities, not even the predefined ones: no reading needs them.
	processEntities: false,
	parseTagValue: false,
	ignoreDeclaration: true,
	ignorePiTags: true,
	isArray: (name, _path, _leaf, isAttribute) =>
		!isAttribute && ['entry', 'link', 'IntervalBlock', 'IntervalReading'].includes(name)
});

/** The file's own words for what kind of reading it holds, when none of it is energy Runrate can use. */
function unusable(kind: ReadingKind): string | null {
	if (kind.uom !== WATT_HOURS)
		return (
			`Its readings are in ESPI unit ${kind.uom ?? '(none given)'}, not watt-hours (unit 72). Runrate ` +
			'imports the electricity a site used; download the electricity use alone.'
		);
	if (kind.flowDirection !== undefined && kind.flowDirection !== FORWARD)
		return 'Its readings are energy sent back to the grid, not the energy the site used.';
	if (REGISTER_TOTALS.has(kind.accumulationBehaviour ?? ''))
		return 'Its readings are running meter totals, not the use of each interval.';
	return null;
}

const tooMany = (count: number) =>
	`The file holds ${count.toLocaleString('en-US')} readings; one import can hold at most ${MAX_INTERVALS.toLocaleString('en-US')}.`;

/** kWh from an ESPI value: value × 10^powerOfTenMultiplier Wh, divided rather than multiplied by small powers so 974 × 10⁻³ stays 0.974. */
const kwhOf = (value: number, multiplier: number) =>
	multiplier >= 3 ? value * 10 ** (multiplier - 3) : value / 10 ** (3 - multiplier);

function readBlock(block: ReadingBlock, into: Interval[], counter: { n: number }): string | null {
	const multiplier = Number(block.kind.powerOfTenMultiplier ?? '0');
	if (!INTEGER.test(block.kind.powerOfTenMultiplier ?? '0') || Math.abs(multiplier) > 12)
		return `The ReadingType’s powerOfTenMultiplier (${block.kind.powerOfTenMultiplier}) is not a whole number from −12 to 12.`;
	for (const reading of block.readings) {
		counter.n += 1;
		const where = `Reading ${counter.n}`;
		const period = isNode(reading.timePeriod) ? reading.timePeriod : {};
		const start = textOf(period.start) ?? '';
		const duration = textOf(period.duration) ?? block.kind.intervalLength ?? '';
		const value = textOf(reading.value) ?? '';
		if (!INTEGER.test(start)) return `${where} has no start time in Unix seconds (found "${start}").`;
		const at = new Date(Number(start) * 1000);
		if (Number.isNaN(at.getTime())) return `${where} starts at an impossible time (${start}).`;
		const seconds = Number(duration);
		if (!INTEGER.test(duration) || seconds <= 0 || seconds > MAX_INTERVAL_SECONDS)
			return `The reading at ${readingTime(at)} lasts "${duration}" seconds; it must be a whole number from 1 to ${MAX_INTERVAL_SECONDS}.`;
		if (!DECIMAL.test(value))
			return `The reading at ${readingTime(at)} has a value that is not a number ("${value}").`;
		const wh = Number(value);
		if (wh < 0)
			return `The reading at ${readingTime(at)} is negative (${value}); energy used is never below zero.`;
		into.push({ start: at, seconds, kwh: kwhOf(wh, multiplier) });
	}
	return null;
}

/**
 * Reads a Green Button "download my data" file (ESPI XML) into intervals of kWh. Refuses, with a
 * message for a person, anything that is not such a file or whose numbers cannot be trusted —
 * nothing partial is ever returned. Prefixed (`espi:`) and default namespaces read the same.
 */
export function parseGreenButton(text: string): UsageRead {
	// Blank lines before the declaration are not strictly XML, but harmless: read past them.
	const xml = text.replace(/^\uFEFF/, '').trimStart();
	if (!xml.startsWith('<')) return { error: 'This is not an XML file.' };
	if (DECLARATION.test(xml)) return { error: DECLARES_ENTITIES };
	// Counted before parsing, so an oversized file is refused without building its tree.
	const readings = xml.match(READING_END)?.length ?? 0;
	if (readings > MAX_INTERVALS) return { error: tooMany(readings) };
	const valid = XMLValidator.validate(xml);
	if (valid !== true)
		return { error: `The XML is malformed or cut short (line ${valid.err.line}: ${valid.err.msg}).` };
	let feed: unknown;
	try {
		feed = parser.parse(xml).feed;
	} catch {
		// Past the validator, what the parser still throws on is elements nested deeper than its
		// maxNestedTags (100 by default); a Green Button feed nests about 8 deep.
		return { error: 'The XML nests its elements far deeper than a Green Button download does.' };
	}
	if (!isNode(feed))
		return { error: 'This XML file is not a Green Button download: it has no Atom feed of readings.' };

	const found = readingBlocks(feed);
	if ('error' in found) return found;
	const usable = found.blocks.filter((block) => unusable(block.kind) === null);
	if (usable.length === 0) return { error: unusable(found.blocks[0]!.kind)! };

	const intervals: Interval[] = [];
	const counter = { n: 0 };
	for (const block of usable) {
		const refused = readBlock(block, intervals, counter);
		if (refused) return { error: refused };
	}
	if (intervals.length === 0)
		return { error: 'The file holds no interval readings: there is nothing to import.' };
	return sortedWithoutOverlap(intervals);
}
