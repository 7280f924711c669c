import { getFunctionList, getManyValues, isMany, none } from 'stream-chain/defs.js';
import parser from 'stream-json/parser.js';
import { ListWalker, type RateItem, type Token } from './list-walker';

export { MAX_RATE_CHARS, type RateItem } from './list-walker';

/**
 * Reads the rates of an open rate database file one at a time, as a stream: the file may be several
 * hundred MB, so it is never held whole. The file is a JSON array of rate objects (the database's bulk
 * export) or the API's `{ "items": [ … ] }`; stream-json's parser turns its text into tokens and
 * `ListWalker` assembles each rate from them.
 */

/** The file cannot be read on: not JSON, or JSON without a list of rates. Rates read before it stand. */
export class RateFileError extends Error {}

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

type Step<I, O> = (input: I | typeof none) => O;

/**
 * stream-json's parser called directly, a piece at a time: its two steps (UTF-8 decoding, then JSON
 * tokens) from stream-chain's function list, so each piece's tokens come back as one array, without
 * a promise per token. Throws where the JSON breaks.
 */
function jsonTokens() {
	// Typed as a plain step, the parser is at run time stream-chain's gen(), which carries its function list.
	const made = parser({ packValues: false, streamValues: true }) as unknown as Parameters<
		typeof getFunctionList
	>[0];
	const [decode, tokenize] = getFunctionList(made) as unknown as [
		Step<Buffer, string>,
		Step<string, unknown>
	];
	const list = (out: unknown): Token[] => (isMany(out) ? getManyValues(out as never) : []);
	return {
		write: (piece: Buffer) => list(tokenize(decode(piece))),
		end: () => [...list(tokenize(decode(none))), ...list(tokenize(none))]
	};
}

/**
 * The rates of `source`, in file order with their 0-based place in the list. Throws RateFileError when
 * the JSON breaks or holds no list; a failure of the source itself passes as it is. `progress.bytes`
 * counts the bytes read so far.
 */
export async function* readRates(
	source: AsyncIterable<Uint8Array>,
	progress: { bytes: number } = { bytes: 0 }
): AsyncGenerator<RateItem> {
	const json = jsonTokens();
	const walker = new ListWalker();
	const tokensOf = (read: () => Token[]) => {
		try {
			return read();
		} catch {
			if (progress.bytes === 0) throw new RateFileError('The file is empty.');
			throw new RateFileError(brokenAt(walker.index + (walker.inRate ? 0 : 1), progress.bytes));
		}
	};
	const walk = function* (tokens: Token[]) {
		for (const token of tokens) {
			const rate = walker.step(token);
			if (walker.notAList) throw new RateFileError(NO_LIST);
			if (rate) yield rate;
		}
	};
	for await (const piece of pieces(source, progress)) yield* walk(tokensOf(() => json.write(piece)));
	yield* walk(tokensOf(() => json.end()));
	if (!walker.sawList) throw new RateFileError(NO_LIST);
}
