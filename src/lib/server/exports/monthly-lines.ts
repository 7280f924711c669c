import { type PeriodResult, hasTouTiers, tieredAmount } from '$lib/calc';
import { a1 } from './cells';
import type { ScenarioFigures } from './figures';
import type { Formats } from './formats';
import type { MonthlyPlan } from './monthly-plan';
import { DEVICE, type ScenarioLayout, deviceMonthRange, scheduleRange } from './scenario-layout';
import type { TariffCells } from './tariff-sheet';
import { billEndCells, demandCells } from './monthly-bill-end';

/** One Monthly cell: its formula (null: a value Runrate computed) and the result the core gives it. */
export interface MonthlyCell {
	col: number;
	formula: string | null;
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

/**
 * Σ over tiers of the kWh that fall in each × its rate: the core's `tieredAmount` as a formula; bounds
 * given per day are multiplied by the days of the month (`days`, the Monthly sheet's column B).
 */
function tierFormula(tiers: NonNullable<TariffCells['energy'][number]>, kwh: string, days: string): string {
	if (!('tiers' in tiers)) return '0';
	let floor = '0';
	return tiers.tiers
		.map((tier) => {
			const bound = tier.uptoKwh !== null && tiers.perDay ? `${tier.uptoKwh}*${days}` : tier.uptoKwh;
			const top = bound === null ? kwh : `MIN(${kwh},${bound})`;
			const term = floor === '0' ? `${top}*${tier.perKwh}` : `MAX(0,${top}-${floor})*${tier.perKwh}`;
			floor = bound ?? floor;
			return term;
		})
		.join('+');
}

/** The cells of one month of one scenario, in the plan's column order. */
export function monthCells(context: MonthContext): MonthlyCell[] {
	const { plan, layout, figures, tariff, period, m, row } = context;
	const month = figures.months[m]?.month ?? 0;
	const cells: MonthlyCell[] = [];
	const put = (col: number, formula: string | null, result: number, format: keyof Formats = 'money') =>
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
		const formula =
			'perMonth' in cell
				? `ROUND(${cell.perMonth},2)`
				: 'perYear' in cell
					? `ROUND(${cell.perYear}/12,2)`
					: `ROUND(${cell.perDay}*${at(2)},2)`;
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
			// Tiers shared among the periods by their kWh: a value (see the Tariff sheet's note).
			put(cols.line, hasTouTiers(charge) ? null : formula, next());
		} else if (cols.tier && cellsOf) {
			const inTiers = applies(charge.months, month) ? period.kwh : 0;
			const scale = charge.type === 'tiered' && charge.tiersPer === 'day' ? period.days : 1;
			const scaled = (charge.type === 'tiered' ? charge.tiers : []).map((tier) => ({
				...tier,
				uptoKwh: tier.uptoKwh === null ? null : tier.uptoKwh * scale
			}));
			const exact = tieredAmount(scaled, inTiers);
			put(cols.tier.kwh, applies(charge.months, month) ? kwh : '0', inTiers, 'kwh');
			put(cols.tier.exact, tierFormula(cellsOf, at(cols.tier.kwh), at(2)), exact);
			const average = `IF(${at(cols.tier.kwh)}>0,${at(cols.tier.exact)}/${at(cols.tier.kwh)},0)`;
			put(cols.tier.average, average, inTiers > 0 ? exact / inTiers : 0, 'rate');
			put(cols.line, `ROUND(${at(cols.tier.exact)},2)`, next());
		} else if (cellsOf && 'perKwh' in cellsOf) {
			put(cols.line, applies(charge.months, month) ? `ROUND(${cellsOf.perKwh}*${kwh},2)` : '0', next());
		}
	});
	demandCells(context, put, next);
	tariff.riders.forEach((perKwh, i) => put(plan.riders[i] ?? 0, `ROUND(${perKwh}*${kwh},2)`, next()));
	billEndCells(context, put, line);
	return cells;
}
