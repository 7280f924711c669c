import { describe, expect, it } from 'vitest';
import { foundWords, keptChoice, PUBLIC_CHOICES, tariffSearchQuery } from './tariff-choice';

const choice = (i: number) => ({ id: `t${i}`, label: `Invented ${i}`, currency: 'USD', versions: [] });

describe('the words of a tariff search', () => {
	it('counts what was found for the words typed', () => {
		expect(foundWords({ search: 'Kestrel', found: 2, choices: [choice(1), choice(2)] })).toBe(
			'2 public tariffs found for “Kestrel”.'
		);
		expect(foundWords({ search: 'Kestrel', found: 1, choices: [choice(1)] })).toBe(
			'1 public tariff found for “Kestrel”.'
		);
	});

	it('says when nothing was found', () => {
		expect(foundWords({ search: 'Nowhere', found: 0, choices: [] })).toBe(
			'No public tariff found for “Nowhere”.'
		);
	});

	it('says only the first 50 are listed when more match', () => {
		const choices = Array.from({ length: PUBLIC_CHOICES }, (_, i) => choice(i));
		expect(foundWords({ search: '', found: 3000, choices })).toBe(
			'3000 public tariffs found in the public library; the first 50 are listed. Add words to narrow it.'
		);
	});
});

describe('the search asked of the API', () => {
	it('asks for public tariffs by utility, 50 at most, with the words encoded', () => {
		expect(tariffSearchQuery('Demo & Co')).toBe('scope=public&sort=utility&pageSize=50&q=Demo%20%26%20Co');
		expect(tariffSearchQuery('')).toBe('scope=public&sort=utility&pageSize=50');
	});
});

describe('the public group after a search', () => {
	const groups = {
		own: { label: 'Own', choices: [choice(1)] },
		public: { label: 'Public library', choices: [choice(2), choice(3)] },
		search: '',
		found: 2
	};

	it('keeps the public tariff chosen in front when the search left it out', () => {
		expect(keptChoice(groups, [choice(4)], 't3').map((c) => c.id)).toEqual(['t3', 't4']);
	});

	it('adds nothing when the choice is found, is an own tariff, or is none', () => {
		expect(keptChoice(groups, [choice(3)], 't3').map((c) => c.id)).toEqual(['t3']);
		expect(keptChoice(groups, [choice(4)], 't1').map((c) => c.id)).toEqual(['t4']);
		expect(keptChoice(groups, [choice(4)], '').map((c) => c.id)).toEqual(['t4']);
	});
});
