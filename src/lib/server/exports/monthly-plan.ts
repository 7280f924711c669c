import type { Tariff } from '$lib/calc';
import { a1, on } from './cells';

export const MONTHLY_SHEET = 'Monthly';
/** Header rows 3 (scenario names) and 4 (column labels); month m (0-based) on row 5 + m; the year below. */
export const FIRST_MONTH_ROW = 5;
export const YEAR_ROW = FIRST_MONTH_ROW + 12;

/** Columns of one scenario's block on the Monthly sheet, in the order of the bill's lines. */
export interface MonthlyPlan {
	first: number;
	kwh: number;
	fixed: number[];
	/** Per energy charge: its line, and for a tiered charge its kWh, exact amount and average rate. */
	energy: Array<{ line: number; tier: { kwh: number; exact: number; average: number } | null }>;
	/** Per demand charge: its measured peak, its billing kW when it has a ratchet, and its line. */
	demand: Array<{ peak: number; billing: number | null; line: number }>;
	riders: number[];
	subtotal: number;
	minimum: number | null;
	/** The yearly minimum's top-up (on the last month of the run of 12), when the tariff has one. */
	yearlyMinimum: number | null;
	taxes: number[];
	total: number;
	last: number;
	/** Every charge line's column, in the bill's order (the total sums these). */
	lines: number[];
	headers: string[];
}

/** Lays out a scenario's columns from `first` on: kWh, each charge (with helpers), subtotal, taxes, total. */
export function monthlyPlan(tariff: Tariff, first: number): MonthlyPlan {
	let col = first;
	const headers: string[] = [];
	const lines: number[] = [];
	const next = (header: string, isLine = false) => {
		headers.push(header);
		if (isLine) lines.push(col);
		return col++;
	};
	const kwh = next('kWh');
	const fixed = tariff.fixedCharges.map((charge) => next(charge.label, true));
	const energy = tariff.energyCharges.map((charge) => {
		if (charge.type !== 'tiered') return { line: next(charge.label, true), tier: null };
		const tier = {
			kwh: next(`${charge.label}: kWh in the tiers`),
			exact: next(`${charge.label}: exact amount`),
			average: next(`${charge.label}: average rate`)
		};
		return { line: next(charge.label, true), tier };
	});
	const demand = tariff.demandCharges.map((charge) => ({
		peak: next(`${charge.label}: peak kW`),
		billing: charge.ratchet ? next(`${charge.label}: billing kW`) : null,
		line: next(charge.label, true)
	}));
	const riders = tariff.riders.map((rider) => next(rider.label, true));
	const subtotal = next('Subtotal');
	const hasFloor = tariff.minimumMonthly != null || tariff.minimumPerDay != null;
	const minimum = hasFloor ? next('Minimum bill', true) : null;
	const yearlyMinimum = tariff.minimumPerYear != null ? next('Yearly minimum', true) : null;
	const taxes = tariff.taxes.map((tax) => next(tax.label, true));
	const total = next('Total');
	return {
		first,
		kwh,
		fixed,
		energy,
		demand,
		riders,
		subtotal,
		minimum,
		yearlyMinimum,
		taxes,
		total,
		last: col - 1,
		lines,
		headers
	};
}

/** A Monthly cell of month m (0-based; 12 is the year row), from another sheet. */
export function monthlyCell(col: number, m: number): string {
	return on(MONTHLY_SHEET, a1(col, FIRST_MONTH_ROW + m, true));
}
