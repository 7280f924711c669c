import { equipmentSchema, unitWatts, type EquipmentInput } from '$lib/calc';
import { periodDays } from '$lib/forms/bill.schema';
import { figure, money } from '$lib/text/numbers';
import type { DeviceSpec } from '../db/schema';
import { equipmentOf, priceScenario } from '$lib/server/sites/results.service';
import type { ScenarioRow } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import type { BillRow } from './bill.service';
import type { Reconciliation } from './reconcile';

/**
 * What the numbers of a bill suggest, in plain words. A saving is never guessed: each "move it to the
 * night" sentence comes from pricing the list again with that one change, for the bill's own period.
 */
const MIN_WATTS = 20;
const NIGHT_START = 22 * 60;
const DAYS_PER_MONTH = 365.25 / 12;

/** Small amounts keep their cents ("$4.20"); larger ones round to whole units ("$37"). */
const moneyAbout = (amount: number, currency: string) =>
	money(amount, currency, amount < 10 ? 'minor' : 'whole');
const whole = (n: number) => figure(n, 0);
const clock = (minutes: number) => {
	const m = ((minutes % 1440) + 1440) % 1440;
	return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
};

/** Hours a day a device runs, when its schedule is a few hours we could place elsewhere. */
function movableHours(schedule: EquipmentInput['schedule']): number | null {
	if (schedule.type === 'hours') return schedule.hoursPerDay;
	if (schedule.type !== 'windows') return null;
	const minutes = schedule.windows.reduce((sum, w) => {
		const [sh = 0, sm = 0] = w.start.split(':').map(Number);
		const [eh = 0, em = 0] = w.end.split(':').map(Number);
		const length = eh * 60 + em - (sh * 60 + sm);
		return sum + (length > 0 ? length : length + 1440);
	}, 0);
	return minutes / 60;
}

function atNight(spec: DeviceSpec, hours: number): DeviceSpec {
	const minutes = Math.round((hours * 60) / 15) * 15;
	const days = 'days' in spec.schedule ? spec.schedule.days : 'all';
	return {
		...spec,
		schedule: {
			type: 'windows',
			windows: [{ start: clock(NIGHT_START), end: clock(NIGHT_START + minutes) }],
			days
		}
	};
}

/** Running kW of all the device's units (its own schema fills the defaults). */
function kwOf(spec: DeviceSpec): number {
	const device = equipmentSchema.safeParse(equipmentOf(spec));
	return device.success ? (unitWatts(device.data.power) * device.data.quantity) / 1000 : 0;
}

async function nightMoves(
	site: SiteRow,
	scenario: ScenarioRow,
	specs: DeviceSpec[],
	bill: BillRow,
	cost: number
) {
	const candidates = specs
		.map((spec, i) => ({
			spec,
			i,
			hours: movableHours(spec.schedule),
			kw: kwOf(spec)
		}))
		.filter((c) => c.hours !== null && c.hours > 0 && c.hours <= 10 && c.kw >= 0.1)
		.sort((a, b) => b.kw * (b.hours ?? 0) - a.kw * (a.hours ?? 0))
		.slice(0, 4);
	const period = { billingPeriods: [{ from: bill.periodFrom, to: bill.periodTo }] };
	const moves: { name: string; hours: number; perMonth: number }[] = [];
	for (const c of candidates) {
		const changed = specs.map((spec, j) => (j === c.i ? atNight(spec, c.hours!) : spec));
		const priced = await priceScenario(site, scenario, changed, period);
		if (!priced.ok) continue;
		const saving = cost - (priced.result.periods[0]?.total ?? cost);
		const perMonth = (saving / periodDays(bill.periodFrom, bill.periodTo)) * DAYS_PER_MONTH;
		if (perMonth >= 1) moves.push({ name: c.spec.name, hours: c.hours!, perMonth });
	}
	return moves.sort((a, b) => b.perMonth - a.perMonth).slice(0, 2);
}

export async function suggestionsFor(
	site: SiteRow,
	scenario: ScenarioRow,
	specs: DeviceSpec[],
	bill: BillRow,
	r: Reconciliation
): Promise<string[]> {
	const lines: string[] = [];
	const share = bill.kwh > 0 ? Math.abs(r.unexplained.kwh) / bill.kwh : 0;
	if (r.unexplained.watts >= MIN_WATTS && share >= 0.03) {
		lines.push(
			`About ${whole(Math.round(r.unexplained.watts / 10) * 10)} W runs all the time that your list does not show — check for a heater or a pump left on, or add the missing device to the list.`
		);
	} else if (r.unexplained.watts <= -MIN_WATTS && share >= 0.05) {
		lines.push(
			`Your list comes to ${whole(-r.unexplained.kwh)} kWh more than the bill: something in it may run less than the list says (a thermostat, a float switch or a timer) — correct its duty or hours.`
		);
	}
	if (r.recomputed.flagged && r.recomputed.differencePercent !== null) {
		const pct = Math.abs(r.recomputed.differencePercent).toFixed(1);
		lines.push(
			`The bill is ${pct} % ${r.recomputed.difference > 0 ? 'more' : 'less'} than the tariff (version ${r.estimated.tariffVersion}) gives for ${whole(bill.kwh)} kWh: check the meter reading, the tariff and any line you do not recognise.`
		);
	}
	for (const move of await nightMoves(site, scenario, specs, bill, r.estimated.cost)) {
		lines.push(
			`Running “${move.name}” for its ${whole(move.hours)} hours from ${clock(NIGHT_START)} instead would save about ${moneyAbout(move.perMonth, site.currency)} a month (the list priced again with that change for this bill’s period).`
		);
	}
	return lines;
}
