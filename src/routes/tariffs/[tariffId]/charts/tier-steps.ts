import type { TariffInput } from '$lib/calc';

type EnergyInput = NonNullable<TariffInput['energyCharges']>[number];
type TieredInput = Extract<EnergyInput, { type: 'tiered' }>;

/** One tier as a step of the chart: its rate from `fromKwh` up to `toKwh` (null: no upper end). */
export interface TierStep {
	fromKwh: number;
	toKwh: number | null;
	perKwh: number;
}

export interface TierChartData {
	label: string;
	months: number[] | undefined;
	steps: TierStep[];
	/** Where the chart's kWh axis ends: half as far again past the last tier boundary. */
	axisKwh: number;
}

/** The tiers of a charge as steps along the billing period's kWh. */
export function tierSteps(tiers: TieredInput['tiers']): TierStep[] {
	let fromKwh = 0;
	return tiers.map((tier) => {
		const step = { fromKwh, toKwh: tier.uptoKwh, perKwh: tier.perKwh };
		fromKwh = tier.uptoKwh ?? fromKwh;
		return step;
	});
}

/** One entry per tiered energy charge, in the tariff's order. */
export function tierCharts(tariff: TariffInput): TierChartData[] {
	return (tariff.energyCharges ?? []).flatMap((charge) => {
		if (charge.type !== 'tiered') return [];
		const steps = tierSteps(charge.tiers);
		const lastBoundary = Math.max(0, ...steps.map((step) => step.toKwh ?? 0));
		// An open-ended last tier has no end to draw; show it over half the span before it.
		const axisKwh = lastBoundary > 0 ? lastBoundary * 1.5 : 1000;
		return [{ label: charge.label, months: charge.months, steps, axisKwh }];
	});
}
