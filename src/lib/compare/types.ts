import type { CompareResponse, DutyRedundancy } from '$lib/calc';

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
	emissionKgPerKwh: number;
	/** Where the emission factor comes from, in the user's words. */
	emissionSource: string;
}

export interface ComparedScenario {
	id: string;
	name: string;
	siteId: string;
	siteName: string;
	tariffName: string;
	tariffVersion: number;
	/** Where the tariff version's figures come from, and when someone last checked them. */
	tariffSource: string;
	tariffCheckedOn: string;
	deviceCount: number;
	/** Annual kWh per device category (water-pump, air-pump, …), only the categories present. */
	kwhByCategory: Record<string, number>;
	/** What still runs when any single unit fails, per duty. */
	redundancy: DutyRedundancy[];
	/** Mains-powered devices in water or on outdoor circuits: show the electrical caution. */
	caution: boolean;
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
