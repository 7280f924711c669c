/** The words for each kind of charge, without the label; `describeTariff` and the diff build on them. */
import type { TariffInput } from '$lib/calc';
import {
	type EnergyInput,
	type TierInput,
	figureText,
	labelWithMonths,
	limitsMonths,
	moneyText,
	perKwhText
} from './rate-phrases';
import { type TiersPer, perDayWords, seasonText } from './tou-sentences';

export type FixedInput = NonNullable<TariffInput['fixedCharges']>[number];

/** "$12.50 a month", "$0.45 a day" or "$120.00 a year (a twelfth each billing period)". */
export function fixedText(charge: FixedInput, currency: string): string {
	if (charge.perMonth !== undefined) return `${moneyText(charge.perMonth, currency)} a month`;
	if (charge.perYear !== undefined) {
		return `${moneyText(charge.perYear, currency)} a year (a twelfth each billing period)`;
	}
	return `${moneyText(charge.perDay ?? 0, currency)} a day`;
}

/**
 * Tiers on the billing period's total kWh: "$0.05 per kWh for the first 500 kWh of each billing
 * period, $0.07 per kWh from 500 to 1,000 kWh, then $0.08 per kWh"; with bounds per day, "for the
 * first 10 kWh a day (× the days of the billing period)" and "from 10 to 20 kWh a day".
 */
export function tiersText(tiers: readonly TierInput[], currency: string, per?: TiersPer): string {
	const day = perDayWords(per);
	const first = per === 'day' ? `${day} (× the days of the billing period)` : ' of each billing period';
	let fromKwh = 0;
	const parts = tiers.map((tier, i) => {
		const rate = perKwhText(tier.perKwh, currency);
		const part =
			tier.uptoKwh === null
				? i === 0
					? `${rate} on all kWh`
					: `then ${rate}`
				: i === 0
					? `${rate} for the first ${figureText(tier.uptoKwh)} kWh${first}`
					: `${rate} from ${figureText(fromKwh)} to ${figureText(tier.uptoKwh)} kWh${day}`;
		fromKwh = tier.uptoKwh ?? fromKwh;
		return part;
	});
	return parts.join(', ');
}

/** One sentence per flat or tiered charge, one per season of a time-of-use charge. */
export function energySentences(charge: EnergyInput, currency: string): string[] {
	if (charge.type === 'flat') {
		return [`${labelWithMonths(charge.label, charge.months)}: ${perKwhText(charge.perKwh, currency)}.`];
	}
	if (charge.type === 'tiered') {
		const tiers = tiersText(charge.tiers, currency, charge.tiersPer);
		return [`${labelWithMonths(charge.label, charge.months)}: ${tiers}.`];
	}
	const [only] = charge.seasons;
	if (charge.seasons.length === 1 && only && !limitsMonths(only.months)) {
		return [`${charge.label}: ${seasonText(only, currency, charge.tiersPer)}.`];
	}
	return charge.seasons.map(
		(season) =>
			`${labelWithMonths(charge.label, season.months)}: ${seasonText(season, currency, charge.tiersPer)}.`
	);
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
