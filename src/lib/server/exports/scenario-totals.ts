import { roundMoney, tieredAmount } from '$lib/calc';
import { a1 } from './cells';
import { MONTHLY_SHEET, monthlyCell } from './monthly-plan';
import type { ScenarioSheetInput } from './scenario-devices';
import { DEVICE } from './scenario-layout';

const applies = (months: readonly number[] | undefined, month: number) => !months || months.includes(month);

/**
 * The rows under the equipment: its totals, the shared cost, the bill from the Monthly sheet, what
 * rounding leaves between them, and the rate per kWh each month that the devices' cost formulas use.
 */
export function writeTotals(input: ScenarioSheetInput): void {
	const { out, layout, figures, tariff, monthly, result, formats, scenario } = input;
	const { firstDevice, lastDevice, totalRow, sharedRow, billRow, roundingRow, rateRow } = layout;
	const column = (col: number) =>
		lastDevice < firstDevice ? '0' : `SUM(${a1(col, firstDevice)}:${a1(col, lastDevice)})`;
	const total = (col: number, format: string, value: (d: number) => number) => {
		const sum = scenario.equipment.reduce((acc, _, d) => acc + value(d), 0);
		out.formula(totalRow, col, column(col), sum, format);
	};
	const devices = scenario.equipment;
	const shares = (d: number, key: 'kwh' | 'cost') =>
		result.periods.reduce((sum, period) => sum + (period.equipment[d]?.[key] ?? 0), 0);
	out.text(totalRow, 1, 'All equipment', 'bold');
	total(DEVICE.runKw, formats.kw, (d) => figures.runKw[d] ?? 0);
	total(DEVICE.standbyKw, formats.kw, (d) => figures.standbyKw[d] ?? 0);
	total(
		DEVICE.capital,
		formats.money,
		(d) => (devices[d]?.quantity ?? 0) * ((devices[d]?.purchaseCost ?? 0) + (devices[d]?.installCost ?? 0))
	);
	total(
		DEVICE.maintenancePerYear,
		formats.money,
		(d) => (devices[d]?.quantity ?? 0) * (devices[d]?.maintenancePerYear ?? 0)
	);
	total(DEVICE.annualKwh, formats.kwh, (d) => shares(d, 'kwh'));
	total(DEVICE.annualCost, formats.money, (d) => shares(d, 'cost'));

	out.text(sharedRow, 1, 'Shared cost: fixed charges and the minimum bill, with their taxes');
	out.text(billRow, 1, `Bill total (${MONTHLY_SHEET} sheet)`, 'bold');
	out.text(roundingRow, 1, 'Rounding: bill − devices − shared (each is rounded to the cent on its own)');
	out.text(rateRow, 1, 'Rate every kWh pays: riders, flat charges and the tiered average rate (formula)');
	result.periods.forEach((period, m) => {
		const col = DEVICE.cost + m;
		const cell = (row: number) => a1(col, row);
		out.formula(totalRow, DEVICE.kwh + m, column(DEVICE.kwh + m), period.kwh, formats.kwh);
		const deviceCost = period.equipment.reduce((sum, share) => sum + share.cost, 0);
		out.formula(totalRow, col, column(col), deviceCost, formats.money);
		// The core's shared cost: the exact fixed charges and the minimum line, grown by the taxes.
		const fixed = tariff.fixed.map((c) =>
			'perMonth' in c ? c.perMonth : 'perYear' in c ? `${c.perYear}/12` : `${c.perDay}*${monthlyCell(2, m)}`
		);
		if (monthly.minimum !== null) fixed.push(monthlyCell(monthly.minimum, m));
		if (monthly.yearlyMinimum !== null) fixed.push(monthlyCell(monthly.yearlyMinimum, m));
		// A ratchet billing demand in a month that measured none: no device caused it, all share it.
		monthly.demand.forEach((cols, k) => {
			if (cols.billing !== null && !((figures.peakKw[k]?.[m] ?? 0) > 0)) {
				fixed.push(monthlyCell(cols.line, m));
			}
		});
		const taxed = tariff.taxRate ? `(${fixed.join('+')})*(1+${tariff.taxRate})` : fixed.join('+');
		out.formula(
			sharedRow,
			col,
			fixed.length === 0 ? '0' : `ROUND(${taxed},2)`,
			period.sharedCost,
			formats.money
		);
		out.formula(billRow, col, monthlyCell(monthly.total, m), period.total, formats.money);
		const rounding = roundMoney(period.total - deviceCost - period.sharedCost);
		out.formula(
			roundingRow,
			col,
			`ROUND(${cell(billRow)}-${cell(totalRow)}-${cell(sharedRow)},2)`,
			rounding,
			formats.money
		);
		const month = figures.months[m]?.month ?? 0;
		const rates: string[] = tariff.ridersPerKwh ? [tariff.ridersPerKwh] : [];
		let rate = tariff.tariff.riders.reduce((sum, rider) => sum + rider.perKwh, 0);
		tariff.tariff.energyCharges.forEach((charge, e) => {
			const cells = tariff.energy[e];
			const tier = monthly.energy[e]?.tier;
			if (charge.type === 'tou' || !cells || !applies(charge.months, month)) return;
			if ('perKwh' in cells && charge.type === 'flat') {
				rates.push(cells.perKwh);
				rate += charge.perKwh;
			} else if (tier && charge.type === 'tiered') {
				rates.push(monthlyCell(tier.average, m));
				const scale = charge.tiersPer === 'day' ? period.days : 1;
				const tiers = charge.tiers.map((t) => ({
					...t,
					uptoKwh: t.uptoKwh === null ? null : t.uptoKwh * scale
				}));
				rate += period.kwh > 0 ? tieredAmount(tiers, period.kwh) / period.kwh : 0;
			}
		});
		out.formula(rateRow, col, rates.join('+') || '0', rate, formats.rate);
	});
}
