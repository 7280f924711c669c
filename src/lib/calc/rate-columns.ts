import type { EnergyCharge, Tariff, TouCharge, TouSeason } from './tariff.schema';

/**
 * What the core sums over each billing period for the energy charges: one column per flat, tiered or
 * untiered time-of-use charge, and for a time-of-use charge whose periods carry tiers one column per
 * season and period (the last of a season being its hours of no period). A column's weight on an
 * interval is money per kWh (`money`) or 1 where it counts kWh (`kwh`, priced once the period's total
 * is known). Without tiered time-of-use charges, column e is charge e.
 */
export type EnergyColumn =
	| { charge: number; kind: 'money' }
	| { charge: number; kind: 'kwh' }
	| { charge: number; kind: 'tou-kwh'; season: number; slot: number };

/** A time-of-use charge with tier limits in any season is priced on its periods' kWh. */
export function hasTouTiers(charge: EnergyCharge): charge is TouCharge {
	return charge.type === 'tou' && charge.seasons.some((season) => (season.tierLimitsKwh?.length ?? 0) > 0);
}

/** The prices of a season's slot (a period, or `periods.length` for the hours of no period), tier by tier. */
export function slotPrices(season: TouSeason, slot: number): number[] {
	const period = season.periods[slot];
	if (period) return [period.perKwh, ...(period.abovePerKwh ?? [])];
	return [season.otherPerKwh, ...(season.otherAbovePerKwh ?? [])];
}

export function energyColumns(tariff: Tariff): EnergyColumn[] {
	return tariff.energyCharges.flatMap((charge, e): EnergyColumn[] => {
		if (hasTouTiers(charge)) {
			return charge.seasons.flatMap((season, s) =>
				Array.from({ length: season.periods.length + 1 }, (_, slot) => ({
					charge: e,
					kind: 'tou-kwh' as const,
					season: s,
					slot
				}))
			);
		}
		return [{ charge: e, kind: charge.type === 'tiered' ? 'kwh' : 'money' }];
	});
}
