import {
	billingSpans,
	buildCalendar,
	type CompareRequest,
	DemandMeter,
	type Equipment,
	groupLoads,
	hasTouTiers,
	ProfileBook,
	RateBook,
	type Schedule,
	type Tariff,
	UsageMeter
} from '$lib/calc';

/**
 * What the workbook cannot express as a simple formula, computed with the core's own modules: the
 * 15-minute grid in the site's time zone (daylight-saving days, weekends, holidays), time-of-use
 * periods and the moment of each demand peak. Everything else in the workbook is a formula over these.
 */
export interface MonthFigures {
	label: string;
	/** 1–12. */
	month: number;
	year: number;
	days: number;
	hours: number;
}

/** Devices that share a schedule and active months, as the core groups them. */
export interface ScheduleFigures {
	schedule: Schedule;
	months: number[];
	/** Per month: hours the devices draw power (standby or running), and hours they run. */
	hours: number[];
	onHours: number[];
	/** Per time-of-use energy charge (by index into the tariff's energy charges), per month: Σ price × hours. */
	tou: Map<number, { weighted: number[]; onWeighted: number[] }>;
	/** Per demand charge, per month: the share of running power they may draw at the peak, or null. */
	atPeak: Array<Array<number | null>>;
}

export interface ScenarioFigures {
	tariff: Tariff;
	months: MonthFigures[];
	schedules: ScheduleFigures[];
	/** Per device (the request's order): index into `schedules`, and its running and standby kW. */
	deviceSchedule: number[];
	runKw: number[];
	standbyKw: number[];
	/** Per demand charge, per month: the peak kW the charge prices, or null when it measures nothing. */
	peakKw: Array<Array<number | null>>;
	/** Per month: the peak kW over all its intervals (what a ratchet looks back on). */
	monthPeakKw: number[];
}

/** The figures of one scenario of a comparison, on its own tariff (or the request's). */
export function scenarioFigures(
	request: CompareRequest,
	equipment: readonly Equipment[],
	tariff: Tariff
): ScenarioFigures {
	const spans = billingSpans(request.period);
	const calendar = buildCalendar(request.timezone, request.holidays, spans);
	const loads = groupLoads(equipment);
	const profiles = new ProfileBook(loads, calendar);
	const rates = new RateBook(tariff, calendar);
	const usage = new UsageMeter(calendar, loads, profiles, rates);
	const demand = new DemandMeter(calendar, profiles, loads.groups);
	// A time-of-use charge with tiers counts kWh, not money, in its columns: its lines are values.
	const touCharges = tariff.energyCharges.flatMap((charge, e) =>
		charge.type === 'tou' && !hasTouTiers(charge) ? [e] : []
	);
	const schedules: ScheduleFigures[] = loads.groups.map((group) => ({
		schedule: loads.schedules[group.schedule] ?? { type: 'always' },
		months: [...group.months.keys()].filter((month) => group.months[month] === 1),
		hours: [],
		onHours: [],
		tou: new Map(touCharges.map((e) => [e, { weighted: [], onWeighted: [] }])),
		atPeak: tariff.demandCharges.map(() => [])
	}));
	const peakKw: ScenarioFigures['peakKw'] = tariff.demandCharges.map(() => []);
	const monthPeakKw: number[] = [];
	const wholeDay = new Uint8Array(256).fill(1);
	const months = spans.map((span, i) => {
		const days = calendar.spans[i];
		if (!days) throw new Error('Calendar is missing a billing period');
		const sums = usage.spanUsage(days);
		schedules.forEach((figures, g) => {
			figures.hours.push(sums.hours[g] ?? 0);
			figures.onHours.push(sums.onHours[g] ?? 0);
			for (const [e, tou] of figures.tou) {
				const column = g * sums.charges + rates.firstColumn(e);
				tou.weighted.push(sums.weighted[column] ?? 0);
				tou.onWeighted.push(sums.onWeighted[column] ?? 0);
			}
		});
		tariff.demandCharges.forEach((charge, k) => {
			const peak = demand.spanPeak(days, (c) => rates.demandMask(k, c), charge.intervalMinutes);
			peakKw[k]?.push(peak ? peak.kw : null);
			schedules.forEach((figures, g) => figures.atPeak[k]?.push(peak ? demand.mayRunAt(g, peak) : null));
		});
		const [year = 0, month = 0] = span.from.split('-').map(Number);
		monthPeakKw.push(demand.spanPeak(days, () => wholeDay, 15)?.kw ?? 0);
		return { label: span.label, month, year, days: days.days, hours: days.hours };
	});
	return {
		tariff,
		months,
		schedules,
		deviceSchedule: loads.devices.map((load) => load.group),
		runKw: loads.devices.map((load) => load.runKw),
		standbyKw: loads.devices.map((load) => load.standbyKw),
		peakKw,
		monthPeakKw
	};
}
