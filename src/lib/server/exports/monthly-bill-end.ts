/** The Monthly sheet's demand lines and the end of each month's bill: subtotal, minimums, taxes, total. */
import { roundMoney } from '$lib/calc';
import { a1 } from './cells';
import { FIRST_MONTH_ROW } from './monthly-plan';
import { type MonthContext, type MonthlyCell } from './monthly-lines';
import { scheduleRange } from './scenario-layout';

type Put = (col: number, formula: string, result: number, format?: MonthlyCell['format']) => void;

/** Σ over tiers of the amount in each: the core's `demandAmount` on tiers, as a formula. */
function demandTierFormula(tiers: ReadonlyArray<{ uptoKw: string | null; perKw: string }>, kw: string) {
	let floor = '0';
	return tiers
		.map((tier) => {
			const top = tier.uptoKw === null ? kw : `MIN(${kw},${tier.uptoKw})`;
			const term = floor === '0' ? `${top}*${tier.perKw}` : `MAX(0,${top}-${floor})*${tier.perKw}`;
			floor = tier.uptoKw ?? floor;
			return term;
		})
		.join('+');
}

/**
 * The earlier months a ratchet looks at (0-based, within this workbook's months): the `monthsBack`
 * before month m, or those of the 11 before whose calendar month is listed — as the core's
 * `ratchetFloorKw`, which looks back on each month's whole peak.
 */
export function ratchetMonths(context: MonthContext, k: number): number[] {
	const ratchet = context.figures.tariff.demandCharges[k]?.ratchet;
	if (!ratchet) return [];
	const back = ratchet.monthsBack ?? 11;
	const earlier: number[] = [];
	for (let j = Math.max(0, context.m - back); j < context.m; j++) {
		const month = context.figures.months[j]?.month ?? 0;
		if (!ratchet.months || ratchet.months.includes(month)) earlier.push(j);
	}
	return earlier;
}

/** Each demand charge: its peak kW, its billing kW (with a ratchet) and its line, as formulas. */
export function demandCells(context: MonthContext, put: Put, next: () => number): void {
	const { plan, layout, figures, tariff, m, row } = context;
	const at = (col: number) => a1(col, row);
	tariff.demand.forEach((cells, k) => {
		const cols = plan.demand[k];
		const first = layout.schedules.atPeak[k];
		if (!cols || first === undefined) return;
		const peak = figures.peakKw[k]?.[m] ?? null;
		const share = scheduleRange(layout, first + m);
		const standby = scheduleRange(layout, layout.schedules.standbyKw);
		const run = scheduleRange(layout, layout.schedules.runKw);
		const formula =
			peak !== null && share && standby && run
				? `SUMPRODUCT(ISNUMBER(${share})*(${standby}+${share}*(${run}-${standby})))`
				: '0';
		put(cols.peak, formula, peak ?? 0, 'kw');
		let billingKw = at(cols.peak);
		if (cols.billing !== null && cells.ratchetPercent) {
			// The ratchet looks back on each earlier month's whole peak (any price or window), written as a
			// value beside the live percent; a charge limited to some months bills nothing outside them.
			const charge = figures.tariff.demandCharges[k];
			const month = figures.months[m]?.month ?? 0;
			const applies = !charge?.months || charge.months.includes(month);
			const earlier = ratchetMonths(context, k);
			const percent = charge?.ratchet?.percent ?? 0;
			const highest = Math.max(0, ...earlier.map((j) => figures.monthPeakKw[j] ?? 0));
			const floor = applies && earlier.length > 0 ? `,${cells.ratchetPercent}/100*${highest}` : '';
			put(
				cols.billing,
				`MAX(${at(cols.peak)}${floor})`,
				Math.max(peak ?? 0, applies ? (percent / 100) * highest : 0),
				'kw'
			);
			billingKw = at(cols.billing);
		}
		const amount =
			'tiers' in cells ? demandTierFormula(cells.tiers, billingKw) : `${cells.perKw}*${billingKw}`;
		put(cols.line, `ROUND(${amount},2)`, next());
	});
}

/**
 * Subtotal, the monthly or daily minimum (the larger floor), the yearly minimum's top-up on the last
 * month (n/12 of it for n months), the taxes on the subtotal with the minimums, and the total.
 */
export function billEndCells(context: MonthContext, put: Put, linesSoFar: number): void {
	const { plan, tariff, period, m, row, figures } = context;
	const at = (col: number) => a1(col, row);
	const charges = period.charges;
	const beforeMinimum = plan.lines.filter((col) => col < plan.subtotal);
	const subtotal = roundMoney(charges.slice(0, linesSoFar).reduce((sum, charge) => sum + charge.amount, 0));
	put(plan.subtotal, `ROUND(${beforeMinimum.map(at).join('+') || '0'},2)`, subtotal);
	const sub = at(plan.subtotal);
	const minimums: string[] = [];
	const line = (label: string) => charges.find((c) => c.kind === 'minimum' && c.label === label)?.amount ?? 0;
	if (plan.minimum !== null) {
		const floors = [tariff.minimum, tariff.minimumPerDay && `${tariff.minimumPerDay}*${at(2)}`];
		const floor = floors.filter(Boolean).join(',');
		put(plan.minimum, `IF(${sub}<MAX(${floor}),ROUND(MAX(${floor})-${sub},2),0)`, line('Minimum bill'));
		minimums.push(at(plan.minimum));
	}
	if (plan.yearlyMinimum !== null && tariff.minimumPerYear) {
		const months = figures.months.length;
		const col = plan.minimum ?? plan.subtotal;
		const range = (c: number) => `${a1(c, FIRST_MONTH_ROW)}:${a1(c, FIRST_MONTH_ROW + months - 1)}`;
		const billed =
			plan.minimum === null
				? `SUM(${range(plan.subtotal)})`
				: `SUM(${range(plan.subtotal)})+SUM(${range(col)})`;
		const floor = `${tariff.minimumPerYear}*${months}/12`;
		const formula = m === months - 1 ? `IF(${billed}<${floor},ROUND(${floor}-(${billed}),2),0)` : '0';
		put(plan.yearlyMinimum, formula, line('Yearly minimum'));
		minimums.push(at(plan.yearlyMinimum));
	}
	const withMinimums = [sub, ...minimums].join('+');
	const taxes = charges.filter((charge) => charge.kind === 'tax');
	tariff.taxes.forEach((percent, i) =>
		put(plan.taxes[i] ?? 0, `ROUND((${withMinimums})*${percent}/100,2)`, taxes[i]?.amount ?? 0)
	);
	put(plan.total, `ROUND(${plan.lines.map(at).join('+') || '0'},2)`, period.total);
}
