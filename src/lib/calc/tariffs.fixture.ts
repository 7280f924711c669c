/**
 * Invented tariff pieces for tests ("Demo Valley Power" and its rates are fictional): short builders
 * for the charges that the core's and the tariff words' tests write again and again.
 */
import type { TariffInput } from './tariff.schema';

export type EnergyChargeInput = NonNullable<TariffInput['energyCharges']>[number];
export type TouSeasonInput = Extract<EnergyChargeInput, { type: 'tou' }>['seasons'][number];
export type TouPeriodInput = TouSeasonInput['periods'][number];

/** A tariff in US dollars with these charges. */
export function usdTariff(more: Omit<TariffInput, 'currency'> = {}): TariffInput {
	return { currency: 'USD', ...more };
}

/** A tiered energy charge from `[uptoKwh, perKwh]` pairs (`null`: the open-ended last tier). */
export function tiered(label: string, ...tiers: Array<[number | null, number]>): EnergyChargeInput {
	return { label, type: 'tiered', tiers: tiers.map(([uptoKwh, perKwh]) => ({ uptoKwh, perKwh })) };
}

/** "Delivery": $0.05 per kWh for the first 500 kWh of the billing period, then $0.08. */
export const twoTierDelivery = (): TariffInput =>
	usdTariff({ energyCharges: [tiered('Delivery', [500, 0.05], [null, 0.08])] });

/** A time-of-use period in one clock window. */
export function touPeriod(
	label: string,
	perKwh: number,
	days: TouPeriodInput['days'],
	start: string,
	end: string
): TouPeriodInput {
	return { label, perKwh, days, windows: [{ start, end }] };
}

/** A time-of-use energy charge of these seasons. */
export function tou(label: string, ...seasons: TouSeasonInput[]): EnergyChargeInput {
	return { label, type: 'tou', seasons };
}

/**
 * A season with tiers inside its periods: 500 kWh at each period's first price, the rest at its second;
 * "Peak" 12:00–18:00 at $0.30 then $0.40, the other hours $0.10 then $0.15.
 */
export function tieredTouSeason(months: number[]): TouSeasonInput {
	return {
		months,
		tierLimitsKwh: [500],
		periods: [
			{ label: 'Peak', perKwh: 0.3, abovePerKwh: [0.4], windows: [{ start: '12:00', end: '18:00' }] }
		],
		otherPerKwh: 0.1,
		otherAbovePerKwh: [0.15]
	};
}
