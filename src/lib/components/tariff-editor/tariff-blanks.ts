import type { TariffInput } from '$lib/calc';

// What the editor adds when a person presses "Add …": each blank is valid on its own, with zero rates
// and round-number hours, so adding a row never shows an error before anything was typed.

export type FixedChargeInput = NonNullable<TariffInput['fixedCharges']>[number];
export type EnergyChargeInput = NonNullable<TariffInput['energyCharges']>[number];
export type TieredChargeInput = Extract<EnergyChargeInput, { type: 'tiered' }>;
export type TouChargeInput = Extract<EnergyChargeInput, { type: 'tou' }>;
export type TierInput = TieredChargeInput['tiers'][number];
export type SeasonInput = TouChargeInput['seasons'][number];
export type TouPeriodInput = SeasonInput['periods'][number];
export type ClockWindowInput = TouPeriodInput['windows'][number];
export type DemandChargeInput = NonNullable<TariffInput['demandCharges']>[number];
export type RiderInput = NonNullable<TariffInput['riders']>[number];
export type TaxInput = NonNullable<TariffInput['taxes']>[number];
export type EnergyType = EnergyChargeInput['type'];
export type DaysInput = NonNullable<TouPeriodInput['days']>;

export const ALL_MONTHS = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12] as const;

export function blankTariff(): TariffInput {
	return {
		currency: 'USD',
		holidaysAsWeekends: true,
		fixedCharges: [],
		energyCharges: [],
		demandCharges: [],
		riders: [],
		taxes: []
	};
}

export function blankFixedCharge(): FixedChargeInput {
	return { label: 'Customer charge', perMonth: 0 };
}

export function blankWindow(): ClockWindowInput {
	return { start: '16:00', end: '21:00' };
}

/** The whole day as one window, the usual weekend hours of a demand charge measured every day. */
export function wholeDay(): ClockWindowInput {
	return { start: '00:00', end: '24:00' };
}

export function blankPeriod(label = 'On-peak'): TouPeriodInput {
	return { label, perKwh: 0, days: 'weekdays', windows: [blankWindow()] };
}

export function blankSeason(months: number[] = [...ALL_MONTHS]): SeasonInput {
	return { months, periods: [blankPeriod()], otherPerKwh: 0 };
}

/** A blank energy charge of a type; switching type keeps the label and any months restriction. */
export function blankEnergyCharge(
	type: EnergyType = 'flat',
	label = 'Energy',
	months?: number[]
): EnergyChargeInput {
	const only = months ? { months } : {};
	if (type === 'tiered') {
		return {
			label,
			type,
			tiers: [
				{ uptoKwh: 500, perKwh: 0 },
				{ uptoKwh: null, perKwh: 0 }
			],
			...only
		};
	}
	if (type === 'tou')
		return { label, type, seasons: [blankSeason(months ? [...months] : undefined)], ...only };
	return { label, type, perKwh: 0, ...only };
}

export function blankDemandCharge(): DemandChargeInput {
	return { label: 'Demand', perKw: 0, intervalMinutes: 15, days: 'all' };
}

export function blankRider(): RiderInput {
	return { label: 'Rider', perKwh: 0 };
}

export function blankTax(): TaxInput {
	return { label: 'Tax', percent: 0 };
}

/** Months with one switched on or off, in calendar order. */
export function toggleMonth(months: readonly number[], month: number): number[] {
	const next = months.includes(month) ? months.filter((m) => m !== month) : [...months, month];
	return next.sort((a, b) => a - b);
}

/**
 * Months of the charge (all twelve, or those it is limited to) that no season holds yet: what a new
 * season starts with.
 */
export function unclaimedMonths(seasons: readonly SeasonInput[], chargeMonths?: readonly number[]): number[] {
	const taken = new Set(seasons.flatMap((season) => season.months));
	return (chargeMonths ?? ALL_MONTHS).filter((month) => !taken.has(month));
}

/**
 * Limits a charge to some months (or, with undefined, to none: all year). A time-of-use charge's
 * seasons follow, so that each month it applies stays in exactly one season without the person
 * redoing them: months it no longer applies leave their season, and months it now applies join the
 * last season (the only one, for the common summer-only adder).
 */
export function setChargeMonths(charge: EnergyChargeInput, months: number[] | undefined): void {
	charge.months = months;
	if (charge.type !== 'tou') return;
	const applies = months ?? [...ALL_MONTHS];
	for (const season of charge.seasons) season.months = season.months.filter((m) => applies.includes(m));
	const last = charge.seasons[charge.seasons.length - 1];
	const joining = unclaimedMonths(charge.seasons, applies);
	if (last && joining.length) last.months = [...last.months, ...joining].sort((a, b) => a - b);
}

export type FixedBasis = 'perMonth' | 'perDay' | 'perYear';
export const FIXED_BASES: readonly FixedBasis[] = ['perMonth', 'perDay', 'perYear'];

/** How a fixed charge is billed: the one amount key it holds (per month when it holds none). */
export function fixedBasis(charge: FixedChargeInput): FixedBasis {
	return FIXED_BASES.find((basis) => basis in charge) ?? 'perMonth';
}

/** Moves a fixed charge between per month, per day and per year, keeping the amount typed. */
export function setFixedBasis(charge: FixedChargeInput, basis: FixedBasis): void {
	const other = fixedBasis(charge);
	if (other === basis || !(other in charge)) return;
	const amount = charge[other];
	const record = charge as Record<string, unknown>;
	delete record[other];
	record[basis] = amount;
}

/** Quarter-hour times of day, "00:00" … "23:45"; with `endOfDay` also "24:00". */
export function quarterHours(endOfDay = false): string[] {
	const times = Array.from({ length: 96 }, (_, i) => {
		const minutes = i * 15;
		return `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
	});
	return endOfDay ? [...times, '24:00'] : times;
}
