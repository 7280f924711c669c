import type { TariffInput } from './tariff.schema';
import type { UrdbRate } from './urdb.schema';
import type { ImportNote } from './urdb-energy';

type Ratchet = NonNullable<NonNullable<TariffInput['demandCharges']>[number]['ratchet']>;

/**
 * The ratchet of the rate's whole-month demand, from `demandratchetpercentage` (12 monthly fractions)
 * or `lookbackPercent` with `lookbackRange` (months back) or `lookbackMonths` (12 flags, one a month). URDB gives these as
 * fractions (0.8 = 80 %), as NREL's REopt reads them. Runrate has one percentage for the year, so
 * monthly percentages that differ cannot be expressed: the ratchet is refused with a note, and so is
 * the tariff, since pricing it without its ratchet would understate the bill. Like the database's,
 * Runrate's ratchet looks back on each month's whole peak whatever price applied, so a ratchet over
 * seasonal whole-month charges (one price in summer, another in winter) is priced as REopt prices it.
 */
export function ratchet(rate: UrdbRate, notes: ImportNote[]): Ratchet | null | undefined {
	const monthly = rate.demandratchetpercentage;
	if (monthly && monthly.some((p) => p > 0)) {
		if (monthly.some((p) => p !== monthly[0])) {
			notes.push({
				code: 'ratchet-monthly',
				field: 'demandratchetpercentage',
				message:
					'The ratchet percentage differs from month to month; Runrate has one for the year, so the rate was not imported'
			});
			return null;
		}
		return { percent: monthly[0]! * 100, monthsBack: 11 };
	}
	const percent = rate.lookbackPercent ?? 0;
	if (percent <= 0) return undefined;
	if (rate.lookbackRange) return { percent: percent * 100, monthsBack: rate.lookbackRange };
	const listed = rate.lookbackMonths ?? [];
	const months = listed.flatMap((on, i) => (on ? [i + 1] : []));
	if (months.length === 0) {
		notes.push({
			code: 'lookback-months',
			field: 'lookbackMonths',
			message: 'A lookback percentage needs a range or months to look back on; the rate was not imported'
		});
		return null;
	}
	return { percent: percent * 100, months };
}
