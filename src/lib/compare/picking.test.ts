import { describe, expect, it } from 'vitest';
import { afterRemoval, scenarioIds, stillPicking } from './picking';

const A = '5c0e0000-0000-4000-8000-000000000101';
const B = '5c0e0000-0000-4000-8000-000000000102';
const C = '5c0e0000-0000-4000-8000-000000000103';

describe('the chooser’s query parameters', () => {
	it('reads ticked boxes and comma-separated links alike, once each', () => {
		expect(scenarioIds(new URLSearchParams(`scenarios=${A}&scenarios=${B},${A}&scenarios=`))).toEqual([A, B]);
	});

	it('is still picking only when asked to and fewer than two are picked', () => {
		expect(stillPicking(new URLSearchParams(`picking=1&scenarios=${A}`))).toBe(true);
		expect(stillPicking(new URLSearchParams('picking=1'))).toBe(true);
		expect(stillPicking(new URLSearchParams(`shown=40&scenarios=${A}`))).toBe(true);
		expect(stillPicking(new URLSearchParams(`picking=1&scenarios=${A},${B}`))).toBe(false);
		// Compare with one scenario keeps its error: "Pick at least two scenarios to compare".
		expect(stillPicking(new URLSearchParams(`scenarios=${A}`))).toBe(false);
	});

	it('removes the scenario a Remove button names, keeps the rest and what was typed', () => {
		const url = new URL(
			`http://x/compare?scenarios=${A}&scenarios=${B}&scenarios=${C}&baseline=${B}&find=alder&horizon=12&remove=${B}`
		);
		const next = new URL(afterRemoval(url)!, url);
		expect(next.pathname).toBe('/compare');
		expect(next.searchParams.get('scenarios')).toBe(`${A},${C}`);
		expect(next.searchParams.has('baseline')).toBe(false);
		expect(next.searchParams.get('find')).toBe('alder');
		expect(next.searchParams.get('horizon')).toBe('12');
		expect(next.searchParams.has('remove')).toBe(false);
		expect(next.searchParams.get('picking')).toBe('1');
	});

	it('keeps the baseline when another is removed, and leads nowhere without a Remove', () => {
		const url = new URL(`http://x/sites/1/justification?scenarios=${A},${B}&baseline=${A}&remove=${B}`);
		const next = new URL(afterRemoval(url)!, url);
		expect(next.searchParams.get('baseline')).toBe(A);
		expect(next.searchParams.get('scenarios')).toBe(A);
		expect(afterRemoval(new URL(`http://x/compare?scenarios=${A},${B}`))).toBeNull();
	});
});
