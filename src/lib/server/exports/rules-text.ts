/**
 * The calculation rules in words, as the /rules page and the core's doc comments state them, for the
 * workbook's Assumptions & sources sheet. Each entry is a heading and its sentences.
 */
export const RULES: ReadonlyArray<readonly [string, string]> = [
	[
		'Power',
		'Each unit draws its watts, or volts × amps × power factor on single phase, or √3 × volts × amps × power factor on three phase (line-to-line volts). The power factor defaults to 1, so nameplate amps × volts overstates a motor’s real power. Running power = per unit × quantity × duty %; when its schedule has it off a device draws its standby watts × quantity; outside its active months it draws nothing.'
	],
	[
		'Time and the calendar',
		'Time runs on 15-minute intervals of real time in the site’s time zone: a day when clocks spring forward has 23 hours, the day they fall back has 25. Time windows are wall-clock times; a window ending before it starts (22:00–06:00) covers the evening and the early morning of the same date. For equipment a public holiday is an ordinary day; for tariff periods and demand windows it prices like a weekend unless the tariff says otherwise.'
	],
	[
		'Schedules',
		'Always on: every interval. Hours a day: spread evenly over the day’s intervals on the chosen days. Time windows: on inside them. On/off cycling: on for on ÷ (on + off) of every interval inside its windows. Triggered runs: runs × minutes per run, spread evenly over its windows.'
	],
	[
		'Energy charges',
		'Several energy charges add up. A flat charge prices every kWh alike; a tiered charge prices the month’s total kWh tier by tier; a time-of-use charge prices each interval at the rate of the first matching period of its season, or the season’s other rate. A charge limited to some months applies only in those months. Daily tiers: bounds given per day are multiplied by the days of the month the charge applies in. Tiers inside time-of-use periods: a season’s tier limits count the month’s kWh across all its periods together; each tier’s kWh is shared among the periods in proportion to their kWh and priced at each period’s price for that tier, so each period’s kWh meet one blended price; a billing period spanning two seasons prorates each season’s limits by its share of the days (limits per day are multiplied by those days).'
	],
	[
		'Demand charges',
		'The largest kW of the month over the charge’s months, days and windows, counting each device at full running power wherever its schedule may run it (a deliberate worst case) and at standby otherwise; for 60-minute demand, each hour’s kW is the mean of its four quarter hours. A charge with other hours at weekends measures weekdays in its windows and weekend days in its weekend windows, one peak over both. Demand tiers price the billing kW tier by tier. A ratchet bills the larger of the month’s peak and its percent of the highest whole-month peak (over all intervals, whatever price or window applied) of earlier months of this calculation only: the given number of months just before, or the listed months among the 11 before; a charge limited to some months bills nothing outside them. Demand a ratchet bills in a month that measured none is shared cost.'
	],
	[
		'Fixed charges, riders, minimum bill and taxes',
		'A per-month charge is billed once a month, a per-day charge × the days in the month, a per-year charge a twelfth each month. Riders are per kWh on all kWh. Subtotal = fixed + energy + demand + riders; below the minimum (the larger of the monthly minimum and the minimum per day × the days), a minimum line adds the difference. A yearly minimum is checked on each run of 12 months (n/12 of it for a shorter run): when their bills before tax fall short, the run’s last month adds the difference. Each tax is its percent of the subtotal with the minimum lines; taxes do not compound.'
	],
	[
		'Rounding',
		'Each charge line is rounded to the cent, halves away from zero, as a bill is; the month’s total is the sum of the rounded lines, and the year’s cost the sum of the months. The devices’ shares are rounded together (largest remainder: each is cut to the cent and the cents left go to the shares that lost most), so they add up with the shared cost to the month’s total exactly. kWh are not rounded.'
	],
	[
		'Each device’s share',
		'A device’s cost is its energy charges at the rates its own intervals met (a tiered charge at the month’s average tier rate), its riders, its part of each demand charge (its kW at the peak), and the taxes on those. Fixed charges and the minimum line are shared cost, rounded to the cent; devices + shared cost = the bill, to the cent.'
	],
	[
		'Comparing scenarios',
		'A scenario is a proposal (bought now) or what is installed (already paid for). A proposal’s capital cost = Σ quantity × (purchase + installation) + its one-off costs; what is installed has only its one-off costs as capital. One-off costs are part of year 0 either way. Year 0’s cash flow is the capital cost; year t’s is the annual cost × (1 + escalation)^(t − 1) + maintenance + the purchase price of every device, installed or proposed, whose life ends in year t (before the horizon). Lifecycle cost = Σ cash flow ÷ (1 + discount rate)^year. Savings = the baseline’s annual cost − this scenario’s. Simple payback = extra capital over the baseline ÷ savings (none when nothing is saved); against an installed baseline that is the proposal’s whole outlay. CO₂ = kWh × the emission factor.'
	]
];

/** What the workbook holds as values, and why; everything else is a formula. */
export const VALUES_NOTE = [
	'Most figures here are live formulas: change a quantity, the watts, amps, volts, power factor, duty, standby watts, costs or life of a device, a flat or tiered rate (daily tiers too), a demand rate, tier or ratchet percent, a fixed charge (per month, day or year), rider, tax or minimum (per month, day or year), or the discount rate, escalation, horizon or emission factor, and the workbook recalculates.',
	'Values, not formulas: the monthly lines of a time-of-use charge with tiers inside its periods (its tiers are shared among the periods by their kWh on the 15-minute grid), and each device’s monthly cost on a tariff with such a charge or with tiered or ratcheted demand (its share depends on the month’s price per kW at the peak). The Tariff sheet says which lines these are.',
	'Some rules are no simple formula, so each scenario sheet holds what Runrate computed for them as values (the schedules table): hours in use and running hours per month (the 15-minute grid, daylight-saving days, weekdays and weekends), the price-weighted hours of each time-of-use charge (its periods, seasons and holidays), and each schedule’s share of running power at each demand peak (when the peak happens). Changing a schedule, active months or a time-of-use rate therefore needs Runrate; a large change in a quantity could also move a demand peak to another moment, which the workbook does not follow.'
];
