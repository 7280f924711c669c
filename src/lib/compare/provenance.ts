// A tariff version's provenance in words: the report, the cost justification and the workbook say it alike.
import { dateInWords } from './printed';
import type { ComparedScenario } from './types';

/** Where a compared scenario's tariff version comes from, as the comparison carries it. */
export type TariffProvenance = Pick<
	ComparedScenario,
	| 'tariffName'
	| 'tariffVersion'
	| 'tariffUtility'
	| 'tariffSource'
	| 'tariffCheckedOn'
	| 'tariffEffectiveFrom'
	| 'tariffEffectiveTo'
	| 'tariffUrdbLabel'
>;

/** A stored date ("2027-01-01") as the reports write it ("1 January 2027"); empty stays empty. */
const day = (iso: string) => (iso ? dateInWords(iso, 'UTC') : '');

/** A stored date in words, as `dateInWords` writes it for a day without a time zone. */
export const dayInWords = day;

/** The days a version is in force, both ends included: "from 1 January 2027 (no end date)". */
export const inForceSpan = (from: string, to: string | null) =>
	to ? `from ${day(from)} to ${day(to)}` : `from ${day(from)} (no end date)`;

/**
 * When a version is in force, both ends included (the core's `versionInForce`):
 * "in force from 1 January 2027 (no end date)", "in force from 1 January 2015 to 31 August 2015".
 */
export const inForceWords = (from: string, to: string | null) => `in force ${inForceSpan(from, to)}`;

/** "source: …, checked 1 December 2026", or that none was given. */
export const sourceWords = (source: string, checkedOn: string) =>
	`${source ? `source: ${source}` : 'no source given'}${checkedOn ? `, checked ${day(checkedOn)}` : ''}`;

/** The open rate database's label in words, or null for a tariff typed in. */
export const urdbLabelWords = (label: string | null) =>
	label ? `OpenEI Utility Rate Database label ${label}` : null;

/**
 * The whole provenance in one sentence, without the final stop:
 * "Fernhollow Power (demo) — Small farm TOU, version 2, in force from 1 January 2027 (no end date):
 * source: …, checked 1 December 2026; OpenEI Utility Rate Database label 5cd…".
 */
export function provenanceSentence(p: TariffProvenance): string {
	const label = urdbLabelWords(p.tariffUrdbLabel);
	return `${p.tariffName}, version ${p.tariffVersion}, ${inForceWords(p.tariffEffectiveFrom, p.tariffEffectiveTo)}: ${sourceWords(p.tariffSource, p.tariffCheckedOn)}${label ? `; ${label}` : ''}`;
}
