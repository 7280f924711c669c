import { none } from 'stream-chain/defs.js';
import Assembler from 'stream-json/assembler.js';
import parser from 'stream-json/parser.js';

/**
 * Reads the rates of an open rate database file one at a time, as a stream: the file may be several
 * hundred MB, so it is never held whole. The file is a JSON array of rate objects (the database's bulk
 * export) or the API's `{ "items": [ … ] }`. stream-json's parser gives tokens with every string,
 * key and number in pieces, so even one huge value is counted before it is held: a rate past
 * MAX_RATE_CHARS is passed over (reported as too large) and the rest are read.
 */

/** The most JSON text one rate may hold: real rates are a few kB; this leaves room for long notes. */
export const MAX_RATE_CHARS = 1_000_000;

export type RateItem = { index: number; rate: unknown } | { index: number; tooLarge: true };

/** The file cannot be read on: not JSON, or JSON without a list of rates. Rates read before it stand. */
export class RateFileError extends Error {}

type Token = { name: string; value?: string };

const NO_LIST =
	'The file holds no list of rates: upload a JSON array of rates, or { "items": [ … ] } as the database’s API answers.';

const megabytes = (bytes: number) =>
	`${(bytes / 1_000_000).toLocaleString('en-US', { maximumFractionDigits: 1 })} MB`;

/** Where the reading stopped, in words: after which rate and how far into the file. */
function brokenAt(rates: number, bytes: number): string {
	const after = rates === 0 ? 'before the first rate' : `after rate ${rates.toLocaleString('en-US')}`;
	return `The file is not valid JSON ${after} (about ${megabytes(bytes)} in): the import stopped there. Rates before that point were handled as the report shows.`;
}

const CLOSE_BRACE = 0x7d;

/**
 * The file's bytes for the parser, cut after every `}`. The parser works a piece at a time and loses the
 * tokens of a piece in which it fails: cut so, a rate's closing brace ends a piece, and every rate
 * before a break in the JSON is read. (`}` is ASCII, so no cut falls inside a UTF-8 character.)
 */
async function* pieces(source: AsyncIterable<Uint8Array>, progress: { bytes: number }) {
	for await (const chunk of source) {
		progress.bytes += chunk.byteLength;
		const bytes = Buffer.isBuffer(chunk)
			? chunk
			: Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength);
		let from = 0;
		for (let at = bytes.indexOf(CLOSE_BRACE); at !== -1; at = bytes.indexOf(CLOSE_BRACE, at + 1)) {
			yield bytes.subarray(from, at + 1);
			from = at + 1;
		}
		if (from < bytes.length) yield bytes.subarray(from);
	}
}

/** The parser refused the text: the JSON is broken here (the source's own failures stay as they are). */
class BrokenJson extends Error {}

/** stream-json's parser, fed piece by piece, its tokens in order; the end of input flushes it. */
async function* tokensOf(source: AsyncIterable<Uint8Array>, progress: { bytes: number }) {
	// At run time the parser is stream-chain's gen(): each call answers an async iterable of tokens.
	const parse = parser({ packValues: false, streamValues: true }) as unknown as (
		input: Buffer | typeof none
	) => AsyncIterable<Token>;
	const parsed = async function* (input: Buffer | typeof none) {
		try {
			yield* parse(input);
		} catch {
			throw new BrokenJson();
		}
	};
	for await (const piece of pieces(source, progress)) yield* parsed(piece);
	yield* parsed(none);
}

/**
 * The rates of `source`, in file order with their 0-based place in the list. Throws RateFileError when
 * the JSON breaks or holds no list; `progress.bytes` counts the bytes read so far.
 */
export async function* readRates(
	source: AsyncIterable<Uint8Array>,
	progress: { bytes: number } = { bytes: 0 }
): AsyncGenerator<RateItem> {
	let level = 0;
	let listLevel = -1; // the depth of the list's items once found: 1 for an array, 2 inside { items }
	let wrapperKey = '';
	let sawList = false;
	let index = -1;
	let asm: Assembler | null = null;
	let chars = 0;
	let tooLarge = false;
	let piece = '';
	const finish = (): RateItem => {
		const item: RateItem = tooLarge ? { index, tooLarge: true } : { index, rate: asm!.current };
		asm = null;
		return item;
	};
	try {
		for await (const token of tokensOf(source, progress)) {
			const { name } = token;
			if (level === 0 && !sawList && name === 'startArray') {
				listLevel = 1;
				sawList = true;
			} else if (level === 0 && !['startArray', 'startObject'].includes(name))
				throw new RateFileError(NO_LIST);
			// Inside the wrapper object: watch its keys for "items" (kept short: a key is only compared).
			if (level === 1 && listLevel !== 1) {
				if (name === 'startKey') wrapperKey = '';
				else if (name === 'stringChunk' && wrapperKey.length < 10) wrapperKey += token.value;
				else if (name === 'startArray' && wrapperKey === 'items' && !sawList) {
					listLevel = 2;
					sawList = true;
				}
			}
			const opens = name === 'startObject' || name === 'startArray';
			const closes = name === 'endObject' || name === 'endArray';
			if (closes) level -= 1;
			const inRate = asm !== null || (level === listLevel && !closes && listLevel > 0 && name !== 'endKey');
			if (inRate) {
				if (!asm) {
					index += 1;
					asm = new Assembler();
					chars = 0;
					tooLarge = false;
				}
				chars += 1 + (token.value?.length ?? 0);
				if (chars > MAX_RATE_CHARS) tooLarge = true;
				if (!tooLarge) feed(asm, token);
				else piece = '';
			}
			if (opens) level += 1;
			// A rate ends when the depth is back at the list's, after a container closes or a primitive ends.
			if (
				asm &&
				level === listLevel &&
				(closes || /^(end(String|Number)|nullValue|trueValue|falseValue)$/.test(name))
			)
				yield finish();
			if (closes && level === listLevel - 1) listLevel = -1;
		}
	} catch (error) {
		if (!(error instanceof BrokenJson)) throw error;
		if (progress.bytes === 0) throw new RateFileError('The file is empty.');
		throw new RateFileError(brokenAt(index + (asm ? 0 : 1), progress.bytes));
	}
	if (!sawList) throw new RateFileError(NO_LIST);

	/** Packs the parser's pieces into whole values for the assembler, within the rate's budget. */
	function feed(into: Assembler, token: Token) {
		switch (token.name) {
			case 'startString':
			case 'startKey':
			case 'startNumber':
				piece = '';
				return;
			case 'stringChunk':
			case 'numberChunk':
				piece += token.value;
				return;
			case 'endString':
				return void into.stringValue(piece);
			case 'endKey':
				return void into.keyValue(piece);
			case 'endNumber':
				return void into.numberValue(piece);
			default:
				into.consume(token);
		}
	}
}
