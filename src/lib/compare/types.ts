import type { CompareResponse, Delivery, DutyRedundancy, OneOffCost, ScenarioStatus } from '$lib/calc';

/**
 * A comparison of stored scenarios as GET /api/v1/compare answers it: the core's `compare()`
 * response plus what the page, the report and the exports need to label it. Browser-safe.
 */
export interface ComparisonQuery {
	/** Scenario ids, two to six, in the order shown. */
	scenarios: string[];
	/** One of `scenarios`. */
	baseline: string;
	/** First month of the 12 compared, "2027-01". */
	start: string;
	horizonYears: number;
	discountPercent: number;
	escalationPercent: number;
	/** 0 when no factor was given: CO₂ then reads "not set" (see `emissionFactorSet`). */
	emissionKgPerKwh: number;
	/** Where the emission factor comes from, in the user's words. */
	emissionSource: string;
}

/** One line of a scenario's equipment list, in words and figures a reader can check. */
export interface ComparedDevice {
	name: string;
	/** The category in words ("Water pump", "UV steriliser"). */
	category: string;
	quantity: number;
	/** Real watts per unit. */
	wattsPerUnit: number;
	/** The schedule in words ("Always on", "8 hours a day, on weekdays"), with its active months. */
	schedule: string;
	kwhPerYear: number;
	/** The device's share of the year's bill. */
	costPerYear: number;
}

export interface ComparedScenario {
	id: string;
	name: string;
	/** Installed (already paid for: year 0 holds only its one-off costs) or proposed (bought now). */
	status: ScenarioStatus;
	description: string;
	oneOffCosts: OneOffCost[];
	equipment: ComparedDevice[];
	/** The workspace that owns the scenario's site. */
	workspaceName: string;
	siteId: string;
	siteName: string;
	tariffName: string;
	tariffVersion: number;
	/** Where the tariff version's figures come from, and when someone last checked them. */
	tariffSource: string;
	tariffCheckedOn: string;
	/** The tariff's utility, as its name begins ("Fernhollow Power (demo)"). */
	tariffUtility: string;
	/** The dates the version is in force, both ends included; null: no end date. */
	tariffEffectiveFrom: string;
	tariffEffectiveTo: string | null;
	/** The open rate database's label of the rate the tariff was imported from; null for one typed in. */
	tariffUrdbLabel: string | null;
	deviceCount: number;
	/** Annual kWh per device category (water-pump, air-pump, …), only the categories present. */
	kwhByCategory: Record<string, number>;
	/** What still runs when any single unit fails, per duty. */
	redundancy: DutyRedundancy[];
	/** Mains-powered devices in water or on outdoor circuits: show the electrical caution. */
	caution: boolean;
	/** What the scenario delivers beside what it costs: water, oxygen, mains in water (core: scenarioDelivery). */
	delivery: Delivery;
}

export interface ComparisonReport {
	query: ComparisonQuery;
	currency: string;
	timezone: string;
	/** Index of the baseline in `scenarios` and `result.scenarios`. */
	baseline: number;
	scenarios: ComparedScenario[];
	/** compare() of the scenarios, in the same order. */
	result: CompareResponse;
	/** The rules and choices behind the figures, in plain sentences. */
	assumptions: string[];
}
