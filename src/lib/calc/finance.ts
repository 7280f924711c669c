import type { Equipment } from './equipment.schema';

export interface Finance {
	horizonYears: number;
	discountPercent: number;
	escalationPercent: number;
}

/**
 * Capital cost, paid in year 0. A proposal buys its equipment now: Σ quantity × (purchase + install)
 * over the devices, plus the one-off costs. What is installed is already paid for: only its one-off
 * costs count now, and its devices are bought again only when their life ends within the horizon.
 */
export function capitalCost(
	equipment: readonly Equipment[],
	oneOffCosts: ReadonlyArray<{ amount: number }>,
	status: 'installed' | 'proposed' = 'proposed'
): number {
	const devices =
		status === 'installed'
			? 0
			: equipment.reduce(
					(sum, device) => sum + device.quantity * (device.purchaseCost + device.installCost),
					0
				);
	return devices + oneOffCosts.reduce((sum, cost) => sum + cost.amount, 0);
}

/** Yearly maintenance: Σ quantity × maintenancePerYear. */
export function maintenancePerYear(equipment: readonly Equipment[]): number {
	return equipment.reduce((sum, device) => sum + device.quantity * device.maintenancePerYear, 0);
}

/**
 * Cash flows from year 0 to the horizon: year 0 is the capital cost; year t ≥ 1 is the annual energy
 * cost escalated (1 + escalation)^(t−1), plus maintenance, plus the purchase cost of every device whose
 * life ends at t (t a multiple of its life, before the horizon; installation is not repeated).
 * Example: life 4, horizon 10 → replacements in years 4 and 8.
 */
export function cashFlows(
	equipment: readonly Equipment[],
	capital: number,
	annualCost: number,
	finance: Finance
): number[] {
	const escalation = finance.escalationPercent / 100;
	const maintenance = maintenancePerYear(equipment);
	const flows = [capital];
	for (let year = 1; year <= finance.horizonYears; year++) {
		const replacements = equipment.reduce((sum, device) => {
			const life = device.lifeYears;
			const due = life !== null && year % life === 0 && year < finance.horizonYears;
			return due ? sum + device.quantity * device.purchaseCost : sum;
		}, 0);
		flows.push(annualCost * (1 + escalation) ** (year - 1) + maintenance + replacements);
	}
	return flows;
}

/**
 * Present value of cash flows with the first at year 0: Σ flow_t / (1 + discount)^t. (A spreadsheet's
 * NPV discounts its first value by one period, so it equals this with year 0 added outside.)
 */
export function presentValue(flows: readonly number[], discountPercent: number): number {
	const rate = discountPercent / 100;
	return flows.reduce((sum, flow, year) => sum + flow / (1 + rate) ** year, 0);
}

/** Simple payback, years: extra capital over yearly savings; null when it never pays back. */
export function simplePaybackYears(
	capital: number,
	baselineCapital: number,
	savingsPerYear: number
): number | null {
	if (savingsPerYear <= 0) return null;
	return Math.max(0, capital - baselineCapital) / savingsPerYear;
}
