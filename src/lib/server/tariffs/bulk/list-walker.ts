import Assembler from 'stream-json/assembler.js';

/**
 * Finds the rates in the parser's tokens and assembles each one, whole, as it ends: the file is a JSON
 * array of rates or an object whose `items` is one. Strings, keys and numbers arrive in pieces, so a
 * rate is measured as it grows: one past MAX_RATE_CHARS is passed over (reported as too large) instead
 * of held.
 */

/** The most JSON text one rate may hold: real rates are a few kB; this leaves room for long notes. */
export const MAX_RATE_CHARS = 1_000_000;

export type Token = { name: string; value?: string };
export type RateItem = { index: number; rate: unknown } | { index: number; tooLarge: true };

const ENDS_A_VALUE = new Set([
	'endObject',
	'endArray',
	'endString',
	'endNumber',
	'nullValue',
	'trueValue',
	'falseValue'
]);

export class ListWalker {
	/** Whether the list of rates has been found (a file without one is refused at its end). */
	sawList = false;
	/** Whether the top level is something other than an array or an object: no list can follow. */
	notAList = false;
	/** The 0-based place of the rate being read or last read (-1 before the first). */
	index = -1;
	private level = 0;
	private listLevel = -1; // the depth of the list's items: 1 for an array, 2 inside { items }
	private wrapperKey = '';
	private asm: Assembler | null = null;
	private chars = 0;
	private tooLarge = false;
	private piece = '';

	/** Whether a rate is being read (started, not yet ended). */
	get inRate() {
		return this.asm !== null;
	}

	/** Takes one token; answers the rate it completes, if any. */
	step(token: Token): RateItem | null {
		const { name } = token;
		if (this.level === 0 && !this.sawList) {
			if (name === 'startArray') {
				this.listLevel = 1;
				this.sawList = true;
			} else if (name !== 'startObject') this.notAList = true;
		}
		// Inside the wrapper object: watch its keys for "items" (kept short: a key is only compared).
		if (this.level === 1 && this.listLevel !== 1) {
			if (name === 'startKey') this.wrapperKey = '';
			else if (name === 'stringChunk' && this.wrapperKey.length < 10) this.wrapperKey += token.value;
			else if (name === 'startArray' && this.wrapperKey === 'items' && !this.sawList) {
				this.listLevel = 2;
				this.sawList = true;
			}
		}
		const closes = name === 'endObject' || name === 'endArray';
		if (closes) this.level -= 1;
		if (!this.asm && this.level === this.listLevel && !closes && this.listLevel > 0) {
			this.index += 1;
			this.asm = new Assembler();
			this.chars = 0;
			this.tooLarge = false;
		}
		if (this.asm) this.take(this.asm, token);
		if (name === 'startObject' || name === 'startArray') this.level += 1;
		let done: RateItem | null = null;
		// A rate ends when the depth is back at the list's, after a container closes or a primitive ends.
		if (this.asm && this.level === this.listLevel && ENDS_A_VALUE.has(name)) {
			done = this.tooLarge
				? { index: this.index, tooLarge: true }
				: { index: this.index, rate: this.asm.current };
			this.asm = null;
		}
		if (closes && this.level === this.listLevel - 1) this.listLevel = -1;
		return done;
	}

	/** Packs the parser's pieces into whole values for the assembler, within the rate's budget. */
	private take(into: Assembler, token: Token) {
		this.chars += 1 + (token.value?.length ?? 0);
		if (this.chars > MAX_RATE_CHARS) {
			this.tooLarge = true;
			this.piece = '';
		}
		if (this.tooLarge) return;
		switch (token.name) {
			case 'startString':
			case 'startKey':
			case 'startNumber':
				this.piece = '';
				return;
			case 'stringChunk':
			case 'numberChunk':
				this.piece += token.value;
				return;
			case 'endString':
				return void into.stringValue(this.piece);
			case 'endKey':
				return void into.keyValue(this.piece);
			case 'endNumber':
				return void into.numberValue(this.piece);
			default:
				into.consume(token);
		}
	}
}
