import { distinctBy, parseRequest } from '$lib/calc';
import type { DeviceSpec } from '$lib/server/db/schema';
import { numberCell } from '$lib/server/sheets/read-sheet';
import { deviceSpecSchema } from '../device-specs';
import { readMonths, readWindows, readYesNo, writeMonths, writeWindows } from './cells';
import { EQUIPMENT_COLUMNS } from './columns';

/** One device row of the equipment sheet to a stored device and back. */
export interface RowError {
	line: number;
	/** A column's field name, or "row" for the row as a whole. */
	field: string;
	message: string;
}

type Cell = (field: string) => string;

const LABELS = new Map(EQUIPMENT_COLUMNS.map((c) => [c.field, c.label]));
const snake = (key: string) => key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** The sheet column a schema issue belongs to: "power.amps" → amps, "schedule.windows.1.end" → windows. */
function fieldOf(path: string): string {
	const [head = '', key = ''] = path.split('.');
	const inner = key !== '' && key !== 'type' && !/^\d+$/.test(key);
	if (head === 'power') return inner ? snake(key) : 'watts';
	if (head === 'schedule') return inner ? snake(key) : 'schedule';
	return head === '' ? 'row' : snake(head);
}

const windowPrefix = (path: string) => {
	const match = /^schedule\.windows\.(\d+)\./.exec(path);
	return match ? `Window ${Number(match[1]) + 1}: ` : '';
};

/** The device a row describes, or each cell's problem. Empty cells take the schema's defaults. */
export function rowToSpec(line: number, cell: Cell): { spec: DeviceSpec } | { errors: RowError[] } {
	const errors: RowError[] = [];
	const fail = (field: string, message: string) => void errors.push({ line, field, message });
	const num = (field: string): number | undefined => {
		const raw = cell(field);
		if (raw === '') return undefined;
		const read = numberCell(raw, LABELS.get(field) ?? field);
		if ('message' in read) return void fail(field, read.message);
		return read.value;
	};
	const flag = (field: string) => {
		const read = readYesNo(cell(field), LABELS.get(field) ?? field);
		if ('message' in read) return void fail(field, read.message);
		return read.value || undefined;
	};

	const watts = num('watts');
	const electrical = ['amps', 'volts', 'power_factor', 'phases'].some((f) => cell(f) !== '');
	const power =
		watts !== undefined || !electrical
			? watts === undefined
				? undefined
				: { watts, ...(electrical ? { amps: num('amps') } : {}) }
			: { amps: num('amps'), volts: num('volts'), powerFactor: num('power_factor'), phases: num('phases') };

	const type = cell('schedule').toLowerCase() || 'always';
	let windows: { start: string; end: string }[] | undefined;
	if (cell('windows') !== '') {
		const read = readWindows(cell('windows'));
		if ('message' in read) fail('windows', read.message);
		else windows = read.windows;
	}
	const days = cell('days').toLowerCase() || undefined;
	const schedule: Record<string, unknown> = { type };
	if (type === 'hours') Object.assign(schedule, { hoursPerDay: num('hours_per_day'), days });
	if (type === 'windows') Object.assign(schedule, { windows: windows ?? [], days });
	if (type === 'cycle')
		Object.assign(schedule, { onMinutes: num('on_minutes'), offMinutes: num('off_minutes') });
	if (type === 'runs') {
		Object.assign(schedule, { runsPerDay: num('runs_per_day'), minutesPerRun: num('minutes_per_run') });
	}
	if (type === 'cycle' || type === 'runs') Object.assign(schedule, { windows, days });

	let months: number[] | undefined;
	if (cell('months') !== '') {
		const read = readMonths(cell('months'));
		if ('message' in read) fail('months', read.message);
		else months = read.months;
	}
	const life = num('life_years');
	const input = {
		name: cell('name'),
		category: cell('category').toLowerCase().replace(/\s+/g, '-') || undefined,
		quantity: num('quantity'),
		power,
		standbyWatts: num('standby_watts'),
		dutyPercent: num('duty_percent'),
		months,
		schedule,
		purchaseCost: num('purchase_cost'),
		installCost: num('install_cost'),
		lifeYears: life ?? null,
		maintenancePerYear: num('maintenance_per_year'),
		waterLpm: num('water_lpm'),
		airLpm: num('air_lpm'),
		inWater: flag('in_water'),
		outdoor: flag('outdoor'),
		notes: cell('notes') || undefined
	};
	if (errors.length) return { errors };
	const parsed = parseRequest(deviceSpecSchema, input);
	if (parsed.success) return { spec: parsed.data as DeviceSpec };
	for (const issue of parsed.error.issues)
		fail(fieldOf(issue.path), windowPrefix(issue.path) + issue.message);
	return { errors: distinctBy(errors, (e) => `${e.field}\u0000${e.message}`) };
}

/** A stored device as sheet cells (numbers stay numbers, so a workbook can add them up). */
export function specToRow(spec: DeviceSpec): Record<string, string | number> {
	const power = spec.power;
	const schedule = spec.schedule;
	const row: Record<string, string | number> = {
		name: spec.name,
		category: spec.category ?? 'other',
		quantity: spec.quantity ?? 1,
		standby_watts: spec.standbyWatts ?? 0,
		duty_percent: spec.dutyPercent ?? 100,
		months: writeMonths(spec.months),
		schedule: schedule.type,
		purchase_cost: spec.purchaseCost ?? 0,
		install_cost: spec.installCost ?? 0,
		life_years: spec.lifeYears ?? '',
		maintenance_per_year: spec.maintenancePerYear ?? 0,
		water_lpm: spec.waterLpm ?? '',
		air_lpm: spec.airLpm ?? '',
		in_water: spec.inWater ? 'yes' : '',
		outdoor: spec.outdoor ? 'yes' : '',
		notes: spec.notes ?? ''
	};
	if ('watts' in power && power.watts !== undefined) row.watts = power.watts;
	else if ('amps' in power) {
		Object.assign(row, {
			amps: power.amps,
			volts: power.volts,
			power_factor: power.powerFactor ?? 1,
			phases: power.phases ?? 1
		});
	}
	if (schedule.type === 'hours')
		Object.assign(row, { hours_per_day: schedule.hoursPerDay, days: schedule.days ?? 'all' });
	if (schedule.type === 'windows')
		Object.assign(row, { windows: writeWindows(schedule.windows), days: schedule.days ?? 'all' });
	if (schedule.type === 'cycle') {
		Object.assign(row, { on_minutes: schedule.onMinutes, off_minutes: schedule.offMinutes });
	}
	if (schedule.type === 'runs') {
		Object.assign(row, { runs_per_day: schedule.runsPerDay, minutes_per_run: schedule.minutesPerRun });
	}
	if (schedule.type === 'cycle' || schedule.type === 'runs') {
		Object.assign(row, { windows: writeWindows(schedule.windows), days: schedule.days ?? 'all' });
	}
	return row;
}
