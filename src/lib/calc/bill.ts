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
	/** Exact amount of each energy and demand charge, in the tariff's order. */
	energy: readonly number[];
	demand: readonly number[];
}

export interface Bill {
	charges: ChargeLine[];
	total: number;
	/** Exact fixed charges and the minimum line, which no device causes. */
	shared: number;
	/** Sum of the tax percents as a fraction, for allocating taxes. */
	taxRate: number;
}

/**
 * The charge lines of one billing period. Each line is rounded to cents on its own; the subtotal is
 * the sum of the rounded fixed, energy, demand and rider lines, as the bill shows them. Below
 * `minimumMonthly`, a minimum line adds the difference. Each tax is its percent of that subtotal
 * (minimum included); taxes do not compound. The total is the sum of the rounded lines.
 * Fixed: `perMonth` once per billing period, `perDay` × its days. Riders: per kWh on all kWh.
 */
export function billLines(tariff: Tariff, input: BillInput): Bill {
	const charges: ChargeLine[] = [];
	const add = (kind: ChargeLine['kind'], label: string, exact: number) =>
		charges.push({ kind, label, amount: roundMoney(exact) });
	let fixed = 0;
	for (const charge of tariff.fixedCharges) {
		const exact = charge.perMonth !== undefined ? charge.perMonth : charge.perDay * input.days;
		fixed += exact;
		add('fixed', charge.label, exact);
	}
	tariff.energyCharges.forEach((charge, i) => add('energy', charge.label, input.energy[i] ?? 0));
	tariff.demandCharges.forEach((charge, i) => add('demand', charge.label, input.demand[i] ?? 0));
	for (const rider of tariff.riders) add('rider', rider.label, rider.perKwh * input.kwh);
	const subtotal = roundMoney(charges.reduce((sum, line) => sum + line.amount, 0));
	let minimum = 0;
	if (tariff.minimumMonthly != null && subtotal < tariff.minimumMonthly) {
		minimum = roundMoney(tariff.minimumMonthly - subtotal);
		add('minimum', 'Minimum bill', minimum);
	}
	for (const tax of tariff.taxes) add('tax', tax.label, ((subtotal + minimum) * tax.percent) / 100);
	const taxRate = tariff.taxes.reduce((sum, tax) => sum + tax.percent / 100, 0);
	const total = roundMoney(charges.reduce((sum, line) => sum + line.amount, 0));
	return { charges, total, shared: fixed + minimum, taxRate };
}
