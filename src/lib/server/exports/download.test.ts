import { describe, expect, it } from 'vitest';
import { download, safeFileName } from './download';

describe('download file names', () => {
	it('keep letters and digits, one dash between words', () => {
		expect(safeFileName('Alder Creek: hatchery!', 'Baseline (2027)')).toBe(
			'alder-creek-hatchery-baseline-2027'
		);
	});
	it('drop accents and anything that could break the header', () => {
		expect(safeFileName('Étang "du" Moulin\r\n', '../x')).toBe('etang-du-moulin-x');
	});
	it('fall back to a plain name when nothing is left', () => {
		expect(safeFileName('★★★')).toBe('runrate-export');
	});
});

describe('a download response', () => {
	it('names the file and its type (RFC 6266 Content-Disposition)', () => {
		const response = download('a,b\r\n', 'list', 'csv');
		expect(response.headers.get('content-type')).toBe('text/csv; charset=utf-8');
		expect(response.headers.get('content-disposition')).toBe('attachment; filename="list.csv"');
	});
});
