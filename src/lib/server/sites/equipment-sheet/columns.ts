/**
 * The columns of Runrate's equipment sheet: one row per device, flat text cells. An uploaded sheet
 * may name its columns differently; `guessMapping` pairs them by name and the person confirms.
 */
export interface EquipmentColumn {
	field: string;
	label: string;
	meaning: string;
	/** Other header words that mean this column, lower case with spaces. */
	aliases: string[];
}

const column = (field: string, label: string, meaning: string, aliases: string[] = []): EquipmentColumn => ({
	field,
	label,
	meaning,
	aliases
});

export const EQUIPMENT_COLUMNS: readonly EquipmentColumn[] = [
	column('name', 'Name', 'Required. Unique within the scenario, such as "Raceway pump 1".', [
		'device',
		'equipment'
	]),
	column(
		'category',
		'Category',
		'water-pump, air-pump, aerator, lighting, heater, chiller, uv, fan, controls or other (empty: other).',
		['type', 'kind']
	),
	column('quantity', 'Quantity', 'How many identical units (empty: 1).', ['qty', 'count', 'units']),
	column('watts', 'Watts', 'Power of one unit while running. Give watts, or amps and volts.', [
		'power',
		'power w',
		'w',
		'rated watts'
	]),
	column('amps', 'Amps', 'Current of one unit while running (with volts).', ['current', 'a']),
	column('volts', 'Volts', 'Supply voltage (with amps).', ['voltage', 'v']),
	column('power_factor', 'Power factor', 'Between 0 and 1, with amps and volts (empty: 1).', ['pf']),
	column('phases', 'Phases', '1 or 3, with amps and volts (empty: 1).', ['phase']),
	column('standby_watts', 'Standby watts', 'Draw while not running (empty: 0).', ['standby']),
	column('duty_percent', 'Duty percent', 'Share of its scheduled time it really runs, 0–100 (empty: 100).', [
		'duty',
		'duty cycle'
	]),
	column('months', 'Months', 'Active months such as "Apr-Sep" or "1,2,11,12" (empty: all year).', ['season']),
	column('schedule', 'Schedule', 'always, hours, windows, cycle or runs (empty: always).', ['runs when']),
	column('hours_per_day', 'Hours per day', 'For the "hours" schedule: 0–24.', ['hours', 'hours a day']),
	column('windows', 'Windows', 'Time windows such as "06:00-09:00, 17:00-21:00" on the quarter hour.', [
		'time windows'
	]),
	column('days', 'Days', 'all, weekdays or weekends (empty: all).', ['day type']),
	column('on_minutes', 'On minutes', 'For the "cycle" schedule: minutes on in each cycle.'),
	column('off_minutes', 'Off minutes', 'For the "cycle" schedule: minutes off in each cycle.'),
	column('runs_per_day', 'Runs per day', 'For the "runs" schedule: how many runs a day.'),
	column('minutes_per_run', 'Minutes per run', 'For the "runs" schedule: minutes of each run.'),
	column('purchase_cost', 'Purchase cost', 'Price of all the units together (empty: 0).', ['price', 'cost']),
	column('install_cost', 'Install cost', 'Cost to install them (empty: 0).', ['installation']),
	column('life_years', 'Life in years', 'Expected life, a whole number of years (empty: unknown).', ['life']),
	column('maintenance_per_year', 'Maintenance per year', 'Yearly upkeep (empty: 0).', ['maintenance']),
	column(
		'water_lpm',
		'Water moved L/min',
		'A water pump: what one unit moves at its working head (empty: not known).',
		['water flow', 'flow lpm', 'water lpm']
	),
	column(
		'air_lpm',
		'Air delivered L/min',
		'An air pump: free air from one unit at its working pressure (empty: not known).',
		['air flow', 'air lpm']
	),
	column('in_water', 'In water', 'yes when mains-powered and in or at the water (empty: no).', ['submerged']),
	column('outdoor', 'Outdoor', 'yes when on an outdoor circuit or receptacle (empty: no).', ['outside']),
	column('notes', 'Notes', 'Free text.', ['note', 'comment', 'comments'])
];

export type EquipmentField = (typeof EQUIPMENT_COLUMNS)[number]['field'];
/** Sheet column index (0-based) for each field, or null when the sheet has none for it. */
export type ColumnMapping = Record<string, number | null>;

/** "Power (W)" → "power w"; "duty_percent" → "duty percent". */
export const headerWords = (header: string) =>
	header
		.toLowerCase()
		.replace(/[^a-z0-9%]+/g, ' ')
		.replace('%', ' percent')
		.trim()
		.replace(/\s+/g, ' ');

/** Pairs each field with the first header cell that names it (by field, label or alias). */
export function guessMapping(header: readonly string[]): ColumnMapping {
	const words = header.map(headerWords);
	const taken = new Set<number>();
	const mapping: ColumnMapping = {};
	for (const c of EQUIPMENT_COLUMNS) {
		const names = new Set([headerWords(c.field), headerWords(c.label), ...c.aliases]);
		const index = words.findIndex((word, i) => !taken.has(i) && names.has(word));
		mapping[c.field] = index === -1 ? null : index;
		if (index !== -1) taken.add(index);
	}
	return mapping;
}
