import { yearlyMinimumTopUps } from './bill';
import { buildCalendar } from './calendar';
import { DemandMeter } from './demand';
import type { MeasuredPeak } from './demand-charges';
import { UsageMeter } from './energy';
import { ProfileBook, groupLoads } from './loads';
import { MeterLoad } from './meter';
import { type Priced, pricePeriod } from './period-price';
import { billingSpans } from './periods';
import { RateBook } from './rates';
import type { CalculateRequest } from './request.schema';
import { roundMoney } from './rounding';
import type { CalculateResponse, PeriodResult } from './types';

/**
 * The request's billing periods priced in order on its tariff, before any yearly minimum. A ratchet
 * looks back on the peaks of the periods before: `earlier` are those of the calculation's periods
 * that came before this run (priced on an earlier version of the tariff; see `calculateAcrossVersions`).
 */
export function priceRun(request: CalculateRequest, earlier: readonly MeasuredPeak[] = []): Priced[] {
	const spans = billingSpans(request.period);
	const calendar = buildCalendar(request.timezone, request.holidays, spans);
	const loads = groupLoads(request.equipment);
	const profiles = new ProfileBook(loads, calendar);
	const rates = new RateBook(request.tariff, calendar);
	const context = {
		request,
		loads,
		rates,
		usage: new UsageMeter(calendar, loads, profiles, rates),
		demand: new DemandMeter(calendar, profiles, loads.groups),
		// The meter's series is read from its own start, so a run may begin months after it.
		meter: request.meter ? new MeterLoad(request.meter, request.timezone, calendar) : null
	};
	const history = [...earlier];
	return spans.map((span, i) => {
		const days = calendar.spans[i];
		if (!days) throw new Error('Calendar is missing a billing period');
		const period = pricePeriod(context, span, days, history);
		history.push(period.peak);
		return period;
	});
}

/**
 * The calculation's periods with the yearly minimum's top-ups (`yearlyMinimumTopUps`: runs of 12 from
 * the calculation's start, each period weighing its own tariff's yearly minimum). A top-up bills the
 * period again from what it measured, with one more line and the taxes on it.
 */
export function withYearlyMinimums(
	periods: ReadonlyArray<{ priced: Priced; perYear: number | null | undefined }>
): PeriodResult[] {
	const topUps = yearlyMinimumTopUps(
		periods.map(({ priced, perYear }) => ({ perYear, subtotal: priced.subtotal }))
	);
	return periods.map(({ priced }, i) => (topUps[i] ? priced.withYearlyMinimum(topUps[i]) : priced.result));
}

/** The totals of a calculation's periods: kWh, cost (the sum of the periods' totals), highest peak. */
export function totalsOf(periods: readonly PeriodResult[]): CalculateResponse['totals'] {
	return {
		kwh: periods.reduce((sum, period) => sum + period.kwh, 0),
		cost: roundMoney(periods.reduce((sum, period) => sum + period.total, 0)),
		peakKw: periods.reduce((peak, period) => Math.max(peak, period.peakKw), 0)
	};
}

/**
 * kWh, peak kW, every charge line and each device's share, per billing period, for a request that has
 * passed `calculateRequestSchema`. Time runs on a 15-minute grid of real instants in the request's time
 * zone; the rules of each step are documented in the module that applies it (schedule, rates, demand,
 * bill, allocation).
 */
export function calculate(request: CalculateRequest): CalculateResponse {
	const perYear = request.tariff.minimumPerYear;
	const periods = withYearlyMinimums(priceRun(request).map((priced) => ({ priced, perYear })));
	return { currency: request.tariff.currency, periods, totals: totalsOf(periods) };
}
