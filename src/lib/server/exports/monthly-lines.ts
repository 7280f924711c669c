import { type PeriodResult, roundMoney, tieredAmount } from '$lib/calc';
import { a1 } from './cells';
import type { ScenarioFigures } from './figures';
import type { Formats } from './formats';
import type { MonthlyPlan } from './monthly-plan';
import { DEVICE, type ScenarioLayout, deviceMonthRange, scheduleRange } from './scenario-layout';
import type { TariffCells } from './tariff-sheet';

/** One Monthly cell: its formula and the result the core's figures give it. */
export interface MonthlyCell {
	col: number;
	formula: string;
	result: number;
	format: keyof Formats;
}

export interface MonthContext {
	plan: MonthlyPlan;
	layout: ScenarioLayout;
	figures: ScenarioFigures;
	tariff: TariffCells;
	period: PeriodResult;
	/** 0-based month and its row. */
	m: number;
	row: number;
}

const applies = (months: readonly number[] | undefined, month: number) => !months || months.includes(month);

/** Σ over tiers of the kWh that fall in each × its rate: the core's `tieredAmount` as a formula. */
function tierFormula(tiers: NonNullable<TariffCells['energy'][number]>, kwh: string): string {
	if (!('tiers' in tiers)) return '0';
	let floor = '0';
	return tiers.tiers
		.map((tier) => {
			const top = tier.uptoKwh === null ? kwh : `MIN(${kwh},${tier.uptoKwh})`;
			const term = floor === '0' ? `${top}*${tier.perKwh}` : `MAX(0,${top}-${floor})*${tier.perKwh}`;
			floor = tier.uptoKwh ?? floor;
			return term;
		})
		.join('+');
}

/** The cells of one month of one scenario, in the plan's column order. */
export function monthCells(context: MonthContext): MonthlyCell[] {
	const { plan, layout, figures, tariff, period, m, row } = context;
	const month = figures.months[m]?.month ?? 0;
	const cells: MonthlyCell[] = [];
	const put = (col: number, formula: string, result: number, format: keyof Formats = 'money') =>
		cells.push({ col, formula, result, format });
	const kwh = a1(plan.kwh, row);
	const at = (col: number) => a1(col, row);
	const charges = period.charges;
	let line = 0;
	const next = () => charges[line++]?.amount ?? 0;
	put(
		plan.kwh,
		deviceMonthRange(layout, DEVICE.kwh, m) ? `SUM(${deviceMonthRange(layout, DEVICE.kwh, m)})` : '0',
		period.kwh,
		'kwh'
	);
	tariff.fixed.forEach((cell, i) => {
		const formula = 'perMonth' in cell ? `ROUND(${cell.perMonth},2)` : `ROUND(${cell.perDay}*${at(2)},2)`;
		put(plan.fixed[i] ?? 0, formula, next());
	});
	figures.tariff.energyCharges.forEach((charge, e) => {
		const cols = plan.energy[e];
		const cellsOf = tariff.energy[e];
		if (!cols) return;
		if (charge.type === 'tou') {
			const block = layout.schedules.tou.get(e);
			const standby = scheduleRange(layout, layout.schedules.standbyKw);
			const run = scheduleRange(layout, layout.schedules.runKw);
			const formula =
				block && standby && run
					? `ROUND(SUMPRODUCT(${standby},${scheduleRange(layout, block.weighted + m)})+SUMPRODUCT(${run}-${standby},${scheduleRange(layout, block.onWeighted + m)}),2)`
					: '0';
			put(cols.line, formula, next());
		} else if (cols.tier && cellsOf) {
			const inTiers = applies(charge.months, month) ? period.kwh : 0;
			const exact = charge.type === 'tiered' ? tieredAmount(charge.tiers, inTiers) : 0;
			put(cols.tier.kwh, applies(charge.months, month) ? kwh : '0', inTiers, 'kwh');
			put(cols.tier.exact, tierFormula(cellsOf, at(cols.tier.kwh)), exact);
			const average = `IF(${at(cols.tier.kwh)}>0,${at(cols.tier.exact)}/${at(cols.tier.kwh)},0)`;
			put(cols.tier.average, average, inTiers > 0 ? exact / inTiers : 0, 'rate');
			put(cols.line, `ROUND(${at(cols.tier.exact)},2)`, next());
		} else if (cellsOf && 'perKwh' in cellsOf) {
			put(cols.line, applies(charge.months, month) ? `ROUND(${cellsOf.perKwh}*${kwh},2)` : '0', next());
		}
	});
	tariff.demand.forEach((perKw, k) => {
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
		put(cols.line, `ROUND(${perKw}*${at(cols.peak)},2)`, next());
	});
	tariff.riders.forEach((perKwh, i) => put(plan.riders[i] ?? 0, `ROUND(${perKwh}*${kwh},2)`, next()));
	const beforeMinimum = plan.lines.filter((col) => col < plan.subtotal);
	const subtotal = roundMoney(charges.slice(0, line).reduce((sum, charge) => sum + charge.amount, 0));
	put(plan.subtotal, `ROUND(${beforeMinimum.map(at).join('+') || '0'},2)`, subtotal);
	const sub = at(plan.subtotal);
	let minimum = '0';
	if (plan.minimum !== null && tariff.minimum) {
		const amount = charges.find((charge) => charge.kind === 'minimum')?.amount ?? 0;
		put(plan.minimum, `IF(${sub}<${tariff.minimum},ROUND(${tariff.minimum}-${sub},2),0)`, amount);
		minimum = at(plan.minimum);
	}
	const taxes = charges.filter((charge) => charge.kind === 'tax');
	tariff.taxes.forEach((percent, i) =>
		put(plan.taxes[i] ?? 0, `ROUND((${sub}+${minimum})*${percent}/100,2)`, taxes[i]?.amount ?? 0)
	);
	put(plan.total, `ROUND(${plan.lines.map(at).join('+') || '0'},2)`, period.total);
	return cells;
}
