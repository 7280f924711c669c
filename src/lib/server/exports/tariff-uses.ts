import type { Tariff } from '$lib/calc';
import type { TariffOrigin } from './tariff-provenance';
import type { TariffUse } from './tariff-sheet';

/**
 * The distinct tariffs of a comparison (equal JSON is one tariff), each with the name, version and
 * provenance the first scenario priced on it gives, and the sheets of the scenarios that use it; `useOf[s]` is the
 * index of scenario s's tariff among them.
 */
export function tariffUses(
	tariffs: readonly Tariff[],
	sheets: readonly string[],
	meta: ReadonlyArray<
		{ tariffName: string; tariffVersion: number | null; tariffOrigin?: TariffOrigin | null } | undefined
	>
): { uses: TariffUse[]; useOf: number[] } {
	const uses: TariffUse[] = [];
	const keys: string[] = [];
	const useOf = tariffs.map((tariff, s) => {
		const key = JSON.stringify(tariff);
		let index = keys.indexOf(key);
		if (index < 0) {
			index = keys.push(key) - 1;
			const about = meta[s];
			uses.push({
				tariff,
				name: about?.tariffName ?? 'Tariff',
				version: about?.tariffVersion ?? null,
				origin: about?.tariffOrigin ?? null,
				scenarios: []
			});
		}
		uses[index]?.scenarios.push(sheets[s] ?? '');
		return index;
	});
	return { uses, useOf };
}
