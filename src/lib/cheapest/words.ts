// The cheapest-tariff figures in words, the same on the page and in the printable report.
import { MONTH_NAMES } from '$lib/calc';
import { money } from '$lib/text/numbers';
import type { TariffProvenance, VersionSource } from './types';

/** "2027-01" → "January 2027"; anything else as it is. */
export function monthWords(month: string): string {
	const parts = /^(\d{4})-(\d{2})$/.exec(month);
	const name = parts && MONTH_NAMES[Number(parts[2]) - 1];
	return name ? `${name} ${parts[1]}` : month;
}

/** "saves $120.00 a year (−$120.00)" / "costs $40.00 more a year (+$40.00)" / "current tariff" / "—" */
export function differenceWords(amount: number | null, currency: string, current: boolean): string {
	if (current) return 'current tariff';
	if (amount === null) return '—';
	if (Math.abs(amount) < 0.005) return 'the same';
	return amount < 0
		? `saves ${money(-amount, currency)} a year (−${money(-amount, currency)})`
		: `costs ${money(amount, currency)} more a year (+${money(amount, currency)})`;
}

/** The difference as a signed amount, for the printed table: "−$120.00" / "+$40.00" / "current" / "—". */
export function differenceFigure(amount: number | null, currency: string, current: boolean): string {
	if (current) return 'current';
	if (amount === null) return '—';
	if (Math.abs(amount) < 0.005) return money(0, currency);
	return amount < 0 ? `−${money(-amount, currency)}` : `+${money(amount, currency)}`;
}

/** "in force from 2027-01-01" / "in force from 2026-01-01 to 2026-12-31" */
export const inForceWords = (v: VersionSource) =>
	v.effectiveTo ? `in force from ${v.effectiveFrom} to ${v.effectiveTo}` : `in force from ${v.effectiveFrom}`;

/** "version 2" / "versions 1 and 2" / "no stored version" */
export function versionNumbersWords(provenance: TariffProvenance): string {
	const numbers = provenance.versions.map((v) => v.number);
	if (!numbers.length) return 'no stored version';
	if (numbers.length === 1) return `version ${numbers[0]}`;
	return `versions ${numbers.slice(0, -1).join(', ')} and ${numbers.at(-1)}`;
}

/** The load priced in words: a scenario's estimated load, or the site's metered usage. */
export const loadWords = (scenarioName: string | null) =>
	scenarioName === null ? 'The site’s metered usage' : `The scenario “${scenarioName}” (estimated load)`;
