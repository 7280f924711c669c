import { tariffSchema } from './tariff.schema';
import type { TariffInput } from './tariff.schema';
import type { UrdbRate } from './urdb.schema';
import { demandCharges } from './urdb-demand';
import { type ImportNote, energyCharge } from './urdb-energy';

export type { ImportNote } from './urdb-energy';

/** What an import gives: the tariff (or null), who and when the rate is from, and the notes. */
export interface UrdbImport {
	/** Null when the rate cannot be expressed: refused, never priced wrongly. */
	tariff: TariffInput | null;
	meta: {
		utility: string | null;
		name: string | null;
		sector: string | null;
		startDate: string | null;
		endDate: string | null;
		label: string | null;
		source: string | null;
	};
	notes: ImportNote[];
}

/**
 * Fields Runrate does not price, named in the notes (never dropped silently): coincident demand,
 * reactive power, distributed generation and export rules, and free-text attributes and comments.
 */
const NOTED =
	/^(coincident.*|.*kvar.*|demandreactivepowercharge|dgrules|.*netmetering.*|.*sell.*|.*attrs|.*comments)$/i;

/** Unix seconds as a calendar date (UTC), or null. */
const DAY_SECONDS = 86_400;

/**
 * The calendar date a database timestamp stands for. The database keeps dates as Unix seconds at about
 * midnight of whatever zone they were entered in (RS-1's end is 23:00 UTC the day before, Georgia
 * Power's start 01:00 UTC), so the nearest UTC midnight gives the date as entered; a timestamp past
 * JavaScript's dates or year 9999 means none.
 */
export function urdbDate(seconds: number | undefined): string | null {
	if (seconds === undefined || !Number.isFinite(seconds)) return null;
	const date = new Date(Math.round(seconds / DAY_SECONDS) * DAY_SECONDS * 1000);
	const year = date.getUTCFullYear();
	return Number.isNaN(year) || year < 1 || year > 9999 ? null : date.toISOString().slice(0, 10);
}
const day = urdbDate;

/** The fixed charge: `fixedchargefirstmeter` (or the legacy `fixedmonthlycharge`) in its units. */
function fixedCharges(rate: UrdbRate, notes: ImportNote[]): TariffInput['fixedCharges'] | null {
	const amount = rate.fixedchargefirstmeter ?? rate.fixedmonthlycharge;
	if (!amount) return [];
	const units = rate.fixedchargeunits ?? '$/month';
	if (units === '$/month') return [{ label: 'Fixed charge', perMonth: amount }];
	if (units === '$/day') return [{ label: 'Fixed charge', perDay: amount }];
	if (units === '$/year') return [{ label: 'Fixed charge', perYear: amount }];
	notes.push({
		code: 'fixed-unit',
		field: 'fixedchargeunits',
		message: `Fixed charges in "${units}" cannot be read; the rate was not imported`
	});
	return null;
}

/** Minimum bills: `mincharge` in its units (or the legacy `minmonthlycharge`) and `annualmincharge`. */
function minimums(rate: UrdbRate, notes: ImportNote[]) {
	const out: Pick<TariffInput, 'minimumMonthly' | 'minimumPerDay' | 'minimumPerYear'> = {
		minimumMonthly: rate.minmonthlycharge ?? null
	};
	if (rate.mincharge) {
		const units = rate.minchargeunits ?? '$/month';
		if (units === '$/month') out.minimumMonthly = rate.mincharge;
		else if (units === '$/day') out.minimumPerDay = rate.mincharge;
		else if (units === '$/year') out.minimumPerYear = rate.mincharge;
		else {
			notes.push({
				code: 'minimum-unit',
				field: 'minchargeunits',
				message: `A minimum charge in "${units}" cannot be read; the rate was not imported`
			});
			return null;
		}
	}
	if (rate.annualmincharge) out.minimumPerYear = Math.max(out.minimumPerYear ?? 0, rate.annualmincharge);
	return out;
}

/**
 * A URDB rate as a Runrate tariff, with notes on what was not taken. Holidays are priced as the
 * weekdays they fall on, as the database's schedules and NREL's engines have no holidays. Anything that
 * would change the bill and cannot be expressed refuses the whole rate (tariff null, a note says why);
 * what is produced always passes the tariff schema, or is refused with its first problem as a note.
 */
export function tariffFromUrdb(rate: UrdbRate): UrdbImport {
	const notes: ImportNote[] = [];
	const energy = energyCharge(rate, notes);
	const demand = demandCharges(rate, notes);
	const fixed = fixedCharges(rate, notes);
	const floors = minimums(rate, notes);
	for (const [field, value] of Object.entries(rate))
		if (NOTED.test(field) && value !== undefined && value !== null && value !== '' && value !== false)
			notes.push({ code: 'not-priced', field, message: `${field} is not priced by Runrate` });
	let tariff: TariffInput | null =
		energy === null || demand === null || fixed === null || floors === null
			? null
			: {
					currency: 'USD',
					holidaysAsWeekends: false,
					fixedCharges: fixed,
					energyCharges: energy ? [energy] : [],
					demandCharges: demand,
					...floors
				};
	const checked = tariff && tariffSchema.safeParse(tariff);
	if (checked && !checked.success) {
		notes.push({
			code: 'invalid',
			field: 'rate',
			message: `The rate does not make a valid tariff: ${checked.error.issues[0]?.message}`
		});
		tariff = null;
	}
	return {
		tariff,
		meta: {
			utility: rate.utility ?? null,
			name: rate.name ?? null,
			sector: rate.sector ?? null,
			startDate: day(rate.startdate),
			endDate: day(rate.enddate),
			label: rate.label ?? null,
			source: rate.source ?? rate.uri ?? null
		},
		notes
	};
}
