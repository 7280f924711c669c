import { oxygenDemandGramsPerHour } from './oxygen-transfer';
import type { SiteWater } from './site-water.schema';
import { SALINITY_G_PER_KG } from './water';

/** The water and stock a design works in: from a site's tank, or typed on the public page. */
export interface DesignConditions {
	temperatureC: number;
	salinityGPerKg: number;
	altitudeM: number;
	oxygenDemandGramsPerHour: number | null;
	tankVolumeLiters: number | null;
}

/** Target dissolved oxygen when no aeration is designed: tilapia eat less below about 5.5 mg/L (common practice). */
export const DEFAULT_TARGET_DO_MG_L = 5;

/**
 * The conditions of one tank (`tankId`), or of all the site's stock (null): the warmest tank's water
 * (it holds the least oxygen), the stock's oxygen demand from its feed, and the tanks' volume. A month
 * (0–11) picks that month's temperature where a tank gives them. No tanks: fresh water at 20 °C, no
 * known demand or volume.
 */
export function designConditions(water: SiteWater, tankId: string | null, month?: number): DesignConditions {
	const chosen = tankId ? water.tanks.filter((t) => t.id === tankId) : water.tanks;
	if (chosen.length === 0)
		return {
			temperatureC: 20,
			salinityGPerKg: 0,
			altitudeM: water.altitudeM,
			oxygenDemandGramsPerHour: null,
			tankVolumeLiters: null
		};
	const temperature = (t: (typeof chosen)[number]) =>
		month !== undefined && t.monthlyTemperatureC
			? (t.monthlyTemperatureC[month] ?? t.temperatureC)
			: t.temperatureC;
	const warmest = chosen.reduce((a, b) => (temperature(b) > temperature(a) ? b : a));
	const fed = chosen.filter((t) => t.feedKgPerDay > 0);
	return {
		temperatureC: temperature(warmest),
		salinityGPerKg: warmest.salinityGPerKg ?? SALINITY_G_PER_KG[warmest.water],
		altitudeM: water.altitudeM,
		oxygenDemandGramsPerHour:
			fed.length === 0
				? null
				: fed.reduce(
						(sum, t) =>
							sum +
							oxygenDemandGramsPerHour({ feedKgPerDay: t.feedKgPerDay, proteinPercent: t.proteinPercent }),
						0
					),
		tankVolumeLiters: chosen.reduce((sum, t) => sum + t.volumeLiters, 0)
	};
}
