import { calculate } from './calculate';
import { capitalCost, cashFlows, maintenancePerYear, presentValue, simplePaybackYears } from './finance';
import type { CompareRequest } from './request.schema';
import { roundMoney } from './rounding';
import type { CompareResponse } from './types';

/**
 * Scenarios side by side over 12 calendar months: each is calculated on its own tariff (or the
 * request's), then costed over the finance horizon. Savings are the baseline's annual cost minus the
 * scenario's; simple payback is the extra capital over the baseline divided by the savings (null when
 * nothing is saved), where an installed scenario's capital is only its one-off costs; lifecycle cost is the present value of the cash flows, year 0 undiscounted.
 * Money from the bills is in cents; the finance figures are left unrounded for the UI to round.
 */
export function compare(request: CompareRequest): CompareResponse {
	const runs = request.scenarios.map((scenario) => {
		const result = calculate({
			period: request.period,
			timezone: request.timezone,
			holidays: request.holidays,
			tariff: scenario.tariff ?? request.tariff,
			equipment: scenario.equipment
		});
		return {
			scenario,
			result,
			capital: capitalCost(scenario.equipment, scenario.oneOffCosts, scenario.status)
		};
	});
	const baseline = runs[request.baseline] ?? runs[0];
	return {
		scenarios: runs.map(({ scenario, result, capital }) => {
			const annualCost = result.totals.cost;
			const flows = cashFlows(scenario.equipment, capital, annualCost, request.finance);
			const savingsPerYear = roundMoney((baseline?.result.totals.cost ?? annualCost) - annualCost);
			return {
				name: scenario.name,
				status: scenario.status,
				annualKwh: result.totals.kwh,
				annualCost,
				capitalCost: capital,
				maintenancePerYear: maintenancePerYear(scenario.equipment),
				savingsPerYear,
				simplePaybackYears: simplePaybackYears(capital, baseline?.capital ?? capital, savingsPerYear),
				lifecycleCost: presentValue(flows, request.finance.discountPercent),
				co2KgPerYear: result.totals.kwh * request.emissionFactorKgPerKwh,
				cashFlows: flows,
				periods: result.periods
			};
		})
	};
}
