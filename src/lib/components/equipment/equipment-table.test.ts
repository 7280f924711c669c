import { describe, expect, it } from 'vitest';
import { equipmentSchema } from '$lib/calc';
import {
	type DeviceSpec,
	type EquipmentRow,
	allIssues,
	blankDevice,
	clientKey,
	deviceLabel,
	duplicateRow,
	fieldId,
	insertRow,
	issuesByRow,
	moveRow,
	removeRow,
	rowDomId,
	rowIssues
} from './equipment-table';

// Every device here is invented test data. Expected messages are the shared schema's own
// (src/lib/calc/equipment.schema.ts, common.schema.ts, fields.ts), so a change there shows up here.

const device = (changes: Partial<DeviceSpec> = {}): DeviceSpec => ({ ...blankDevice(), ...changes });
const rowsOf = (...names: string[]): EquipmentRow[] =>
	names.map((name, i) => ({ key: `k${i}`, spec: device({ name }) }));

describe('a blank device', () => {
	it('passes the Equipment schema as it stands', () => {
		expect(equipmentSchema.safeParse(blankDevice()).success).toBe(true);
		expect(rowIssues(blankDevice())).toEqual([]);
	});

	it('is a 1-unit water pump of 100 W, always on', () => {
		expect(blankDevice()).toMatchObject({
			category: 'water-pump',
			quantity: 1,
			power: { watts: 100 },
			schedule: { type: 'always' }
		});
	});

	it('is a fresh object each time, so two rows never share one', () => {
		const a = blankDevice();
		a.name = 'Changed';
		expect(blankDevice().name).toBe('Water pump');
	});
});

describe('a row with impossible values', () => {
	it.each<[string, Partial<DeviceSpec>, string, string]>([
		['negative watts', { power: { watts: -5 } }, 'power.watts', 'Watts must be zero or more'],
		[
			'an empty watts box',
			{ power: { watts: undefined as unknown as number } },
			'power.watts',
			'Watts is required'
		],
		[
			'more than 24 hours a day',
			{ schedule: { type: 'hours', hoursPerDay: 25 } },
			'schedule.hoursPerDay',
			'Hours per day must be at most 24'
		],
		[
			'a window off the 15-minute grid',
			{ schedule: { type: 'windows', windows: [{ start: '06:10', end: '18:00' }] } },
			'schedule.windows.0.start',
			'Start must be on a quarter hour (:00, :15, :30 or :45)'
		],
		[
			'runs longer than their window',
			{
				schedule: {
					type: 'runs',
					runsPerDay: 5,
					minutesPerRun: 30,
					windows: [{ start: '06:00', end: '08:00' }]
				}
			},
			'schedule',
			'5 runs of 30 minutes (150 minutes) do not fit in the 120 minutes of the windows'
		],
		['no active month', { months: [] }, 'months', 'Months must not be empty'],
		['an empty name', { name: '  ' }, 'name', 'Name must not be empty'],
		['half a unit', { quantity: 1.5 }, 'quantity', 'Quantity must be a whole number'],
		['a duty over 100 %', { dutyPercent: 120 }, 'dutyPercent', 'Duty percent must be at most 100'],
		['negative standby', { standbyWatts: -1 }, 'standbyWatts', 'Standby watts must be zero or more']
	])('refuses %s with a message at the field', (_situation, changes, path, message) => {
		expect(rowIssues(device(changes))).toContainEqual({ path, message });
	});

	it('names the missing amps of an amps × volts power, not the watts of the other form', () => {
		const spec = device({ power: { amps: undefined as unknown as number, volts: 120 } });
		expect(rowIssues(spec)).toEqual([{ path: 'power.amps', message: 'Amps is required' }]);
	});

	it('reports every problem of a half-filled amps × volts power at once', () => {
		const spec = device({ power: { amps: undefined as unknown as number, volts: 0, powerFactor: 1.2 } });
		expect(rowIssues(spec)).toEqual(
			expect.arrayContaining([
				{ path: 'power.amps', message: 'Amps is required' },
				{ path: 'power.volts', message: 'Volts must be at least 1' },
				{ path: 'power.powerFactor', message: 'Power factor must be at most 1' }
			])
		);
	});

	it('takes the safety flags and notes as part of a valid device', () => {
		expect(rowIssues(device({ inWater: true, outdoor: true, notes: 'Invented note' }))).toEqual([]);
	});

	it('takes what a unit delivers as optional, and names a negative flow at its own field', () => {
		expect(rowIssues(device({ waterLpm: 120 }))).toEqual([]);
		expect(rowIssues(device({ airLpm: -1 }))).toEqual([
			{ path: 'airLpm', message: 'Air delivered must be zero or more' }
		]);
		expect(rowIssues(device({ waterLpm: -5 })).map((i) => i.path)).toEqual(['waterLpm']);
	});
});

describe('issues across the table', () => {
	it('leads each row problem with its row index', () => {
		const rows = rowsOf('Air pump', 'Heater');
		rows[1]!.spec.power = { watts: -1 };
		expect(allIssues(rows)).toEqual([{ path: '1.power.watts', message: 'Watts must be zero or more' }]);
	});

	it('sorts server issues into rows with paths relative to the device', () => {
		const byRow = issuesByRow([
			{ path: '3.power.amps', message: 'Amps must be zero or more' },
			{ path: 'equipment.0.name', message: 'Name must not be empty' },
			{ path: '3', message: 'Equipment must be an object' },
			{ path: 'tariff', message: 'Tariff is required' }
		]);
		expect(byRow.get(3)).toEqual([
			{ path: 'power.amps', message: 'Amps must be zero or more' },
			{ path: '', message: 'Equipment must be an object' }
		]);
		expect(byRow.get(0)).toEqual([{ path: 'name', message: 'Name must not be empty' }]);
		expect(byRow.get(-1)).toEqual([{ path: 'tariff', message: 'Tariff is required' }]);
	});

	it('is the inverse of the table-wide paths it gives', () => {
		const rows = rowsOf('A', 'B', 'C');
		rows[2]!.spec.quantity = 0;
		const byRow = issuesByRow(allIssues(rows));
		expect(byRow.get(2)).toEqual(rowIssues(rows[2]!.spec));
		expect(byRow.has(0)).toBe(false);
	});
});

describe('reordering rows', () => {
	const names = (rows: readonly EquipmentRow[]) => rows.map((row) => row.spec.name);

	it('moves a row up and down by one place', () => {
		const rows = rowsOf('A', 'B', 'C');
		expect(names(moveRow(rows, 2, -1))).toEqual(['A', 'C', 'B']);
		expect(names(moveRow(rows, 0, 1))).toEqual(['B', 'A', 'C']);
	});

	it('leaves the order alone at either end', () => {
		const rows = rowsOf('A', 'B');
		expect(names(moveRow(rows, 0, -1))).toEqual(['A', 'B']);
		expect(names(moveRow(rows, 1, 1))).toEqual(['A', 'B']);
	});

	it('keeps each row with its key', () => {
		const moved = moveRow(rowsOf('A', 'B'), 1, -1);
		expect(moved.map((row) => row.key)).toEqual(['k1', 'k0']);
	});
});

describe('duplicating, deleting and undoing', () => {
	it('puts a detached copy with a new key right below the original', () => {
		const rows = rowsOf('Air pump', 'Heater');
		const next = duplicateRow(rows, 0, 'new');
		expect(next.map((row) => row.key)).toEqual(['k0', 'new', 'k1']);
		expect(next[1]!.spec.name).toBe('Air pump (copy)');
		next[1]!.spec.power = { watts: 5 };
		expect(rows[0]!.spec.power).toEqual({ watts: 100 });
	});

	it('keeps a copied name within the 120 characters a name may have', () => {
		const next = duplicateRow([{ key: 'a', spec: device({ name: 'x'.repeat(118) }) }], 0, 'b');
		expect(next[1]!.spec.name).toHaveLength(120);
	});

	it('deletes a row and puts it back at its place', () => {
		const rows = rowsOf('A', 'B', 'C');
		const removed = removeRow(rows, 1);
		expect(removed.map((row) => row.spec.name)).toEqual(['A', 'C']);
		expect(insertRow(removed, 1, rows[1]!).map((row) => row.spec.name)).toEqual(['A', 'B', 'C']);
		expect(insertRow(removed, 9, rows[1]!).map((row) => row.spec.name)).toEqual(['A', 'C', 'B']);
	});
});

describe('names and ids', () => {
	it('names a device by its name, or by its place while the name is empty', () => {
		expect(deviceLabel(device({ name: ' Air pump ' }), 0)).toBe('Air pump');
		expect(deviceLabel(device({ name: '' }), 2)).toBe('device 3');
	});

	it('makes keys that differ', () => {
		expect(new Set(Array.from({ length: 50 }, clientKey)).size).toBe(50);
	});

	it('makes element ids from any key', () => {
		expect(rowDomId('12')).toBe('eq-12');
		expect(rowDomId('a b/c')).toBe('eq-a_b_c');
		expect(fieldId('eq-12', 'schedule.windows.0.start')).toBe('eq-12-schedule-windows-0-start');
		expect(fieldId('eq-12', '')).toBe('eq-12');
	});
});
