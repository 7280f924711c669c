import type { EnergyColumn } from './rate-columns';
import { slotPrices } from './rate-columns';
import type { Tariff } from './tariff.schema';

/**
 * kWh of a total in each tier, for cumulative upper limits (tier i ends at `limits[i]`, the last tier
 * is open-ended): 1,500 kWh on a limit of 1,000 is [1,000, 500].
 */
export function tierKwh(limits: readonly number[], kwh: number): number[] {
	const shares: number[] = [];
	let floor = 0;
	for (const limit of [...limits, Infinity]) {
		shares.push(Math.max(0, Math.min(kwh, limit) - floor));
		floor = limit;
	}
	return shares;
}

export interface EnergyPricing {
	/** Exact amount of each energy charge, in the tariff's order. */
	amounts: number[];
	/**
	 * Per column: null when its sums are already money, else the price per kWh every kWh of the column
	 * met this billing period (a tier's kWh shared by the columns in proportion to their kWh).
	 */
	columnRates: Array<number | null>;
}

/**
 * The energy charges of one billing period from its column sums. A tiered charge's limits apply to the
 * period's kWh in the charge, or, per day, to that × the days it applies. A tiered time-of-use season
 * tiers the kWh of all its periods together (the rule NREL's engines use for the open rate database):
 * tier i's kWh is shared among the periods in proportion to their kWh, each at its own price of that
 * tier, so a period's kWh all meet one blended price. Limits per period are prorated by the share of
 * the billing period's days in the season's months (whole when billing periods are calendar months);
 * limits per day are multiplied by those days.
 */
export function priceEnergy(
	tariff: Tariff,
	columns: readonly EnergyColumn[],
	sums: readonly number[],
	daysIn: (months: readonly number[] | undefined) => number,
	periodDays: number
): EnergyPricing {
	const amounts = tariff.energyCharges.map(() => 0);
	const columnRates: Array<number | null> = columns.map(() => null);
	columns.forEach((column, c) => {
		const charge = tariff.energyCharges[column.charge];
		const sum = sums[c] ?? 0;
		if (!charge || column.kind === 'money') {
			amounts[column.charge] = (amounts[column.charge] ?? 0) + sum;
		} else if (column.kind === 'kwh' && charge.type === 'tiered') {
			const scale = charge.tiersPer === 'day' ? daysIn(charge.months) : 1;
			const limits = charge.tiers.slice(0, -1).map((tier) => (tier.uptoKwh ?? Infinity) * scale);
			const amount = tierKwh(limits, sum).reduce(
				(total, kwh, t) => total + kwh * (charge.tiers[t]?.perKwh ?? 0),
				0
			);
			amounts[column.charge] = (amounts[column.charge] ?? 0) + amount;
			columnRates[c] = sum > 0 ? amount / sum : (charge.tiers[0]?.perKwh ?? 0);
		}
	});
	// Tiered time-of-use: a season's columns are adjacent; price them together once, at the first.
	columns.forEach((column, c) => {
		if (column.kind !== 'tou-kwh' || column.slot !== 0) return;
		const charge = tariff.energyCharges[column.charge];
		const season = charge?.type === 'tou' ? charge.seasons[column.season] : undefined;
		if (!charge || charge.type !== 'tou' || !season) return;
		const slots = season.periods.length + 1;
		const kwh = sums.slice(c, c + slots);
		const total = kwh.reduce((sum, value) => sum + value, 0);
		const seasonDays = daysIn(season.months);
		const scale = charge.tiersPer === 'day' ? seasonDays : periodDays > 0 ? seasonDays / periodDays : 0;
		const inTiers = tierKwh(
			(season.tierLimitsKwh ?? []).map((limit) => limit * scale),
			total
		);
		for (let slot = 0; slot < slots; slot++) {
			const prices = slotPrices(season, slot);
			const rate =
				total > 0
					? inTiers.reduce((sum, tierKwhs, t) => sum + (tierKwhs / total) * (prices[t] ?? 0), 0)
					: (prices[0] ?? 0);
			columnRates[c + slot] = rate;
			amounts[column.charge] = (amounts[column.charge] ?? 0) + rate * (kwh[slot] ?? 0);
		}
	});
	return { amounts, columnRates };
}
