import { readFileSync } from 'node:fs';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { MAX_RATE_CHARS, RateFileError, readRates, type RateItem } from './rate-stream';

// A real rate's shape: Florida Power & Light's RS-1 (2015), a public record from the open rate database
// (tests/fixtures/urdb/). The generated files repeat it under invented labels.
const RS1 = JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8')) as Record<
	string,
	unknown
>;

const encoder = new TextEncoder();

// A full collection before each heap sample, so the figure is what the reader keeps alive, not garbage
// the collector has not reached yet (Node's documented flag, set at run time for this file).
setFlagsFromString('--expose-gc');
const collect = runInNewContext('gc') as () => void;
const liveHeap = () => {
	collect();
	return process.memoryUsage().heapUsed;
};

/** A file made piece by piece as it is read, never whole: `[`, the rates, `]`, in chunks of about 64 kB. */
async function* generated(count: number, rateAt: (i: number) => string, wrap = (s: string) => `[${s}]`) {
	const [open = '', close = ''] = wrap('\u0000').split('\u0000');
	let buffer = open;
	for (let i = 0; i < count; i += 1) {
		buffer += (i ? ',' : '') + rateAt(i);
		if (buffer.length > 65_536) {
			yield encoder.encode(buffer);
			buffer = '';
		}
	}
	yield encoder.encode(buffer + close);
}

const rateJson = (i: number, extra: Record<string, unknown> = {}) =>
	JSON.stringify({ ...RS1, label: `bulk-test-${i}`, name: `Invented rate ${i}`, ...extra });

async function all(source: AsyncIterable<Uint8Array>): Promise<RateItem[]> {
	const items: RateItem[] = [];
	for await (const item of readRates(source)) items.push(item);
	return items;
}

const labels = (items: RateItem[]) =>
	items.map((item) => ('rate' in item ? (item.rate as { label: string }).label : 'too large'));

describe('a file of many rates', () => {
	it('reads 2,000 rates of about 25 kB each (50 MB) one at a time, keeping a few MB alive', async () => {
		// Each rate carries a 20 kB description, so the file is far larger than the heap it may use.
		const note = 'Invented description. '.repeat(1000);
		const before = liveHeap();
		let peak = before;
		let count = 0;
		const progress = { bytes: 0 };
		const started = performance.now();
		for await (const item of readRates(
			generated(2000, (i) => rateJson(i, { description: note })),
			progress
		)) {
			expect(item.index).toBe(count);
			count += 1;
			if (count % 100 === 0) peak = Math.max(peak, liveHeap());
		}
		const seconds = (performance.now() - started) / 1000;
		const growthMb = (peak - before) / 1e6;
		console.log(
			`2,000 rates, ${(progress.bytes / 1e6).toFixed(1)} MB: ${seconds.toFixed(1)} s, peak live heap growth ${growthMb.toFixed(1)} MB`
		);
		expect(count).toBe(2000);
		expect(progress.bytes).toBeGreaterThan(45_000_000);
		// Held whole, the text alone would be 48 MB (96 MB as JavaScript strings) before any parsing.
		expect(growthMb).toBeLessThan(8);
	}, 120_000);

	it('reads the API’s { "items": [ … ] } answer, passing over the other keys', async () => {
		const items = await all(
			generated(
				3,
				(i) => rateJson(i),
				(s) => `{"count":3,"note":"x","items":[${s}],"after":[1,2]}`
			)
		);
		expect(labels(items)).toEqual(['bulk-test-0', 'bulk-test-1', 'bulk-test-2']);
	});

	it('hands on an entry that is not a rate as it stands, for the import to refuse, and reads the rest', async () => {
		const items = await all(generated(3, (i) => (i === 1 ? '"not a rate"' : rateJson(i))));
		expect(items.map((item) => ('rate' in item ? item.rate : null))).toMatchObject([
			{ label: 'bulk-test-0' },
			'not a rate',
			{ label: 'bulk-test-2' }
		]);
	});

	it('passes over a rate past the size limit, reports it, and reads on', async () => {
		const huge = 'x'.repeat(MAX_RATE_CHARS + 10);
		const items = await all(generated(3, (i) => rateJson(i, i === 1 ? { description: huge } : {})));
		expect(labels(items)).toEqual(['bulk-test-0', 'too large', 'bulk-test-2']);
		expect(items[1]).toEqual({ index: 1, tooLarge: true });
	});
});

describe('a file that breaks', () => {
	it('stops at malformed JSON mid-file with a message saying where, after yielding the rates before it', async () => {
		const seen: string[] = [];
		const source = generated(5, (i) => (i === 3 ? '{"label": "broken", "name": tru' : rateJson(i)));
		const reading = (async () => {
			for await (const item of readRates(source)) seen.push(labels([item])[0]!);
		})();
		await expect(reading).rejects.toThrow(RateFileError);
		await expect(reading).rejects.toThrow(
			/not valid JSON after rate 3 \(about 0 MB in\): the import stopped there/
		);
		expect(seen).toEqual(['bulk-test-0', 'bulk-test-1', 'bulk-test-2']);
	});

	it('passes on a failure of the source itself as it is, not as broken JSON', async () => {
		async function* failing() {
			yield encoder.encode(`[${rateJson(0)},`);
			throw new Error('Part 2 of the upload is gone from the store');
		}
		await expect(all(failing())).rejects.toThrow('Part 2 of the upload is gone from the store');
	});

	it.each([
		['an object without items', '{"rates": []}'],
		['a number', '42'],
		['a string', '"rates"']
	])('refuses %s: there is no list of rates', async (_, text) => {
		await expect(
			all(
				generated(
					0,
					() => '',
					() => text
				)
			)
		).rejects.toThrow(/holds no list of rates/);
	});

	it('refuses an empty file and text that is not JSON, in words', async () => {
		await expect(
			all(
				generated(
					0,
					() => '',
					() => ''
				)
			)
		).rejects.toThrow('The file is empty.');
		await expect(
			all(
				generated(
					0,
					() => '',
					() => 'label,name\nx,y'
				)
			)
		).rejects.toThrow(/not valid JSON before the first rate/);
	});
});
