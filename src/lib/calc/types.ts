/** The JSON shapes the core answers with (POST /api/v1/calculate and /api/v1/compare). */

export type ChargeKind = 'fixed' | 'energy' | 'demand' | 'rider' | 'minimum' | 'tax';

export interface ChargeLine {
	kind: ChargeKind;
	label: string;
	/** Rounded to cents, half away from zero. */
	amount: number;
}

export interface EquipmentShare {
	name: string;
	/** Unrounded; the UI rounds for display. */
	kwh: number;
	cost: number;
}

export interface PeriodResult {
	label: string;
	from: string;
	to: string;
	days: number;
	hours: number;
	kwh: number;
	peakKw: number;
	charges: ChargeLine[];
	/** The sum of the rounded charge lines. */
	total: number;
	/** Fixed and minimum lines (with their taxes), which belong to no device. */
	sharedCost: number;
	/** In the request's order. */
	equipment: EquipmentShare[];
	/** The measured load's share, when the request gave a meter. */
	meter?: { kwh: number; cost: number };
}

export interface CalculateResponse {
	currency: string;
	periods: PeriodResult[];
	totals: { kwh: number; cost: number; peakKw: number };
}

export interface ScenarioResult {
	name: string;
	/** Installed (already paid for) or proposed (bought now): decides what year 0's capital holds. */
	status: 'installed' | 'proposed';
	annualKwh: number;
	annualCost: number;
	capitalCost: number;
	maintenancePerYear: number;
	savingsPerYear: number;
	simplePaybackYears: number | null;
	lifecycleCost: number;
	co2KgPerYear: number;
	/** Year 0 (capital) to the horizon. */
	cashFlows: number[];
	periods: PeriodResult[];
}

export interface CompareResponse {
	scenarios: ScenarioResult[];
}
