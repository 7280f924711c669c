import { roundMoney } from './rounding';
import type { EnergyCharge, Tariff } from './tariff.schema';
import type { ChargeLine } from './types';

type Tier = Extract<EnergyCharge, { type: 'tiered' }>['tiers'][number];

/** A tiered charge on a billing period's kWh, tier by tier: each tier's rate on the kWh that fall in it. */
export function tieredAmount(tiers: readonly Tier[], kwh: number): number {
	let amount = 0;
	let floor = 0;
	for (const tier of tiers) {
		const ceiling = tier.uptoKwh ?? Infinity;
		if (kwh > floor) amount += (Math.min(kwh, ceiling) - floor) * tier.perKwh;
		floor = ceiling;
	}
	return amount;
}

export interface BillInput {
	days: number;
	kwh: number;
	/** This period's part of a yearly minimum (see `yearlyMinimumTopUps`); 0 when none. */
	yearlyMinimum?: number;
	/** Exact amount of each energy and demand charge, in the tariff's order. */
	energy: readonly number[];
	demand: readonly number[];
}

export interface Bill {
	charges: ChargeLine[];
	total: number;
	/** Exact fixed charges and the minimum lines, which no device causes. */
	shared: number;
	/** Sum of the tax percents as a fraction, for allocating taxes. */
	taxRate: number;
}

/**
 * The charge lines of one billing period. Each line is rounded to cents on its own; the subtotal is
 * the sum of the rounded fixed, energy, demand and rider lines, as the bill shows them. Below
 * the floor — the larger of `minimumMonthly` and `minimumPerDay` × the days — a minimum line adds the
 * difference; a yearly minimum's top-up, when this period closes a year short of it, is one more line.
 * Each tax is its percent of that subtotal (minimums included); taxes do not compound. The total is
 * the sum of the rounded lines. Fixed: `perMonth` once per billing period, `perDay` × its days,
 * `perYear` a twelfth. Riders: per kWh on all kWh.
 */
export function billLines(tariff: Tariff, input: BillInput): Bill {
	const charges: ChargeLine[] = [];
	const add = (kind: ChargeLine['kind'], label: string, exact: number) =>
		charges.push({ kind, label, amount: roundMoney(exact) });
	let fixed = 0;
	for (const charge of tariff.fixedCharges) {
		const exact =
			charge.perMonth !== undefined
				? charge.perMonth
				: charge.perDay !== undefined
					? charge.perDay * input.days
					: (charge.perYear ?? 0) / 12;
		fixed += exact;
		add('fixed', charge.label, exact);
	}
	tariff.energyCharges.forEach((charge, i) => add('energy', charge.label, input.energy[i] ?? 0));
	tariff.demandCharges.forEach((charge, i) => add('demand', charge.label, input.demand[i] ?? 0));
	for (const rider of tariff.riders) add('rider', rider.label, rider.perKwh * input.kwh);
	const subtotal = roundMoney(charges.reduce((sum, line) => sum + line.amount, 0));
	let minimum = 0;
	const floor = Math.max(tariff.minimumMonthly ?? 0, (tariff.minimumPerDay ?? 0) * input.days);
	const hasFloor = tariff.minimumMonthly != null || tariff.minimumPerDay != null;
	if (hasFloor && subtotal < floor) {
		minimum = roundMoney(floor - subtotal);
		add('minimum', 'Minimum bill', minimum);
	}
	if (input.yearlyMinimum) {
		const topUp = roundMoney(input.yearlyMinimum);
		minimum += topUp;
		add('minimum', 'Yearly minimum', topUp);
	}
	for (const tax of tariff.taxes) add('tax', tax.label, ((subtotal + minimum) * tax.percent) / 100);
	const taxRate = tariff.taxes.reduce((sum, tax) => sum + tax.percent / 100, 0);
	const total = roundMoney(charges.reduce((sum, line) => sum + line.amount, 0));
	return { charges, total, shared: fixed + minimum, taxRate };
}

/**
 * The yearly minimum's top-up of each billing period. The calculation's periods go in runs of 12 from
 * its start (the last run may be shorter). A run's floor is a twelfth of the yearly minimum for each of
 * its periods priced on a tariff that has one — so a shorter run's floor is n/12 of it, and across a
 * change of tariff version each version's minimum counts for the months it was in force (common
 * practice: a changed rate is prorated by the time it applied). When those periods' bills before
 * taxes (fixed charges and monthly minimums included) add up to less than the floor, the last of them
 * gets the difference. A new version does not start a new year: the same tariff split into two
 * versions bills as one.
 *
 * Example: 12 months, $120 a year before July and $240 from July, $5 billed a month: the floor is
 * 6 × 10 + 6 × 20 = 180, the bills 60, and December gets 120.
 */
export function yearlyMinimumTopUps(
	periods: ReadonlyArray<{ perYear: number | null | undefined; subtotal: number }>
): number[] {
	const topUps = periods.map(() => 0);
	for (let start = 0; start < periods.length; start += 12) {
		let floor = 0;
		let billed = 0;
		let last = -1;
		for (let i = start; i < Math.min(start + 12, periods.length); i++) {
			const { perYear, subtotal } = periods[i]!;
			if (perYear == null) continue;
			floor += perYear;
			billed += subtotal;
			last = i;
		}
		floor /= 12;
		if (last >= 0 && billed < floor) topUps[last] = roundMoney(floor - billed);
	}
	return topUps;
}
