/** The words for each kind of charge, without the label; `describeTariff` and the diff build on them. */
import type { TariffInput } from '$lib/calc';
import {
	type EnergyInput,
	type TierInput,
	type TouSeasonInput,
	daysText,
	figureText,
	limitsMonths,
	moneyText,
	monthsText,
	whenText,
	windowsText
} from './rate-phrases';

export type FixedInput = NonNullable<TariffInput['fixedCharges']>[number];
export type DemandInput = NonNullable<TariffInput['demandCharges']>[number];

/** "$12.50 a month" or "$0.45 a day". */
export function fixedText(charge: FixedInput, currency: string): string {
	if (charge.perMonth !== undefined) return `${moneyText(charge.perMonth, currency)} a month`;
	if (charge.perYear !== undefined) {
		return `${moneyText(charge.perYear, currency)} a year (a twelfth each billing period)`;
	}
	return `${moneyText(charge.perDay ?? 0, currency)} a day`;
}

/** "$0.18 per kWh". */
export function perKwhText(perKwh: number, currency: string): string {
	return `${moneyText(perKwh, currency)} per kWh`;
}

/**
 * Tiers on the billing period's total kWh: "$0.05 per kWh for the first 500 kWh of each billing
 * period, $0.07 per kWh from 500 to 1,000 kWh, then $0.08 per kWh".
 */
export function tiersText(tiers: readonly TierInput[], currency: string): string {
	let fromKwh = 0;
	const parts = tiers.map((tier, i) => {
		const rate = perKwhText(tier.perKwh, currency);
		const part =
			tier.uptoKwh === null
				? i === 0
					? `${rate} on all kWh`
					: `then ${rate}`
				: i === 0
					? `${rate} for the first ${figureText(tier.uptoKwh)} kWh of each billing period`
					: `${rate} from ${figureText(fromKwh)} to ${figureText(tier.uptoKwh)} kWh`;
		fromKwh = tier.uptoKwh ?? fromKwh;
		return part;
	});
	return parts.join(', ');
}

/** "On-peak $0.32 per kWh on weekdays 16:00–21:00". */
export function touPeriodText(period: TouSeasonInput['periods'][number], currency: string): string {
	return `${period.label} ${perKwhText(period.perKwh, currency)} ${whenText(period.days, period.windows)}`;
}

/** "$0.12 per kWh at other times" (or "at all times" when the season has no periods). */
export function otherTimesText(season: TouSeasonInput, currency: string): string {
	const when = season.periods.length > 0 ? 'at other times' : 'at all times';
	return `${perKwhText(season.otherPerKwh, currency)} ${when}`;
}

/** A season's periods, then its other rate, separated by semicolons. */
export function seasonText(season: TouSeasonInput, currency: string): string {
	const periods = season.periods.map((period) => touPeriodText(period, currency));
	return [...periods, otherTimesText(season, currency)].join('; ');
}

/** "Energy", "Energy, June–September": the label with the months a charge is limited to. */
export function labelWithMonths(label: string, months: readonly number[] | undefined): string {
	return limitsMonths(months) ? `${label}, ${monthsText(months)}` : label;
}

/** One sentence per flat or tiered charge, one per season of a time-of-use charge. */
export function energySentences(charge: EnergyInput, currency: string): string[] {
	if (charge.type === 'flat') {
		return [`${labelWithMonths(charge.label, charge.months)}: ${perKwhText(charge.perKwh, currency)}.`];
	}
	if (charge.type === 'tiered') {
		return [`${labelWithMonths(charge.label, charge.months)}: ${tiersText(charge.tiers, currency)}.`];
	}
	const [only] = charge.seasons;
	if (charge.seasons.length === 1 && only && !limitsMonths(only.months)) {
		return [`${charge.label}: ${seasonText(only, currency)}.`];
	}
	return charge.seasons.map(
		(season) => `${labelWithMonths(charge.label, season.months)}: ${seasonText(season, currency)}.`
	);
}

/**
 * "$8.00 per kW of the highest 15-minute demand in the billing period (weekdays 12:00–20:00,
 * June–September)"; the brackets hold only the limits the charge has.
 */
export function demandText(charge: DemandInput, currency: string): string {
	const limits: string[] = [];
	const windows = windowsText(charge.windows);
	if ((charge.days ?? 'all') !== 'all' || windows) {
		limits.push([daysText(charge.days), windows].filter(Boolean).join(' '));
	}
	if (limitsMonths(charge.months)) limits.push(monthsText(charge.months));
	const minutes = charge.intervalMinutes ?? 15;
	const of = `of the highest ${minutes}-minute demand in the billing period`;
	const base = charge.tiers
		? `${demandTiersText(charge.tiers, currency)}, ${of}`
		: `${moneyText(charge.perKw ?? 0, currency)} per kW ${of}`;
	const text = limits.length > 0 ? `${base} (${limits.join(', ')})` : base;
	return charge.ratchet ? `${text}; ${ratchetText(charge.ratchet)}` : text;
}

/** "$10.00 per kW for the first 100 kW, then $15.00 per kW". */
function demandTiersText(tiers: NonNullable<DemandInput['tiers']>, currency: string): string {
	let fromKw = 0;
	return tiers
		.map((tier, i) => {
			const rate = `${moneyText(tier.perKw, currency)} per kW`;
			if (tier.uptoKw === null) return i === 0 ? rate : `then ${rate}`;
			const part =
				i === 0
					? `${rate} for the first ${figureText(tier.uptoKw)} kW`
					: `${rate} from ${figureText(fromKw)} to ${figureText(tier.uptoKw)} kW`;
			fromKw = tier.uptoKw;
			return part;
		})
		.join(', ');
}

/** "billed on at least 80 % of the highest peak of the 11 months before" (or of listed months). */
function ratchetText(ratchet: NonNullable<DemandInput['ratchet']>): string {
	const of = ratchet.months
		? `of ${monthsText(ratchet.months)} in the 11 months before`
		: `of the ${ratchet.monthsBack === 1 ? 'month' : `${ratchet.monthsBack} months`} before`;
	return `billed on at least ${figureText(ratchet.percent)} % of the highest peak ${of}`;
}

/** A rider on all kWh; a negative one is a credit. */
export function riderText(perKwh: number, currency: string): string {
	if (perKwh < 0) return `a credit of ${perKwhText(-perKwh, currency)} on all kWh`;
	return `${perKwhText(perKwh, currency)} on all kWh`;
}

/** "4% of the bill before tax": taxes do not compound, each is a share of the same subtotal. */
export function taxText(percent: number): string {
	return `${figureText(percent)}% of the bill before tax`;
}
