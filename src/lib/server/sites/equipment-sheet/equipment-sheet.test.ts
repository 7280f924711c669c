import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import type { DeviceSpec } from '$lib/server/db/schema';
import { readMonths, writeMonths } from './cells';
import { guessMapping } from './columns';
import { describeRowError, parseEquipmentSheet } from './parse';
import { equipmentCsv, equipmentTemplateCsv, equipmentXlsx } from './write';

// Invented devices; nothing here describes a real site.
const bytes = (text: string) => new TextEncoder().encode(text);
const LIST: DeviceSpec[] = [
	{
		name: 'Raceway pump',
		category: 'water-pump',
		quantity: 2,
		power: { watts: 750 },
		schedule: { type: 'always' },
		inWater: true,
		waterLpm: 380,
		purchaseCost: 900,
		lifeYears: 8
	},
	{
		name: 'Blower',
		category: 'air-pump',
		power: { amps: 4.2, volts: 230, powerFactor: 0.86, phases: 1 },
		standbyWatts: 3,
		airLpm: 60,
		schedule: { type: 'always' }
	},
	{
		name: 'Lights',
		category: 'lighting',
		quantity: 4,
		power: { watts: 300 },
		months: [1, 2, 3, 10, 11, 12],
		schedule: {
			type: 'windows',
			windows: [
				{ start: '05:00', end: '09:00' },
				{ start: '17:00', end: '21:00' }
			],
			days: 'weekdays'
		}
	},
	{
		name: 'Heater',
		category: 'heater',
		power: { watts: 1500 },
		dutyPercent: 40,
		schedule: { type: 'hours', hoursPerDay: 12, days: 'all' }
	},
	{
		name: 'Flush',
		category: 'water-pump',
		power: { watts: 250 },
		schedule: { type: 'runs', runsPerDay: 6, minutesPerRun: 5, days: 'all' },
		notes: '=cmd|calc'
	},
	{
		name: 'Skimmer',
		category: 'fan',
		power: { watts: 40 },
		schedule: {
			type: 'cycle',
			onMinutes: 15,
			offMinutes: 45,
			windows: [{ start: '22:00', end: '06:00' }],
			days: 'weekends'
		}
	}
];

async function read(text: string, takenNames: string[] = []) {
	const sheet = await parseEquipmentSheet(bytes(text), 'csv', { takenNames });
	if ('error' in sheet) throw new Error(sheet.error);
	return sheet;
}

describe('an exported list read back', () => {
	it('gives the same devices from CSV', async () => {
		const sheet = await read(equipmentCsv(LIST));
		expect(sheet.errors).toEqual([]);
		expect(sheet.devices.map((d) => d.spec.name)).toEqual(LIST.map((d) => d.name));
		const spec = (i: number) => sheet.devices[i]?.spec;
		expect(spec(0)).toMatchObject({
			quantity: 2,
			power: { watts: 750 },
			inWater: true,
			waterLpm: 380,
			purchaseCost: 900,
			lifeYears: 8
		});
		expect(spec(1)?.power).toEqual({ amps: 4.2, volts: 230, powerFactor: 0.86, phases: 1 });
		expect(spec(1)?.airLpm).toBe(60);
		expect(spec(2)).toMatchObject({ months: [1, 2, 3, 10, 11, 12], schedule: LIST[2]?.schedule });
		expect(spec(3)?.schedule).toEqual({ type: 'hours', hoursPerDay: 12, days: 'all' });
		expect(spec(4)?.notes).toBe('=cmd|calc');
		expect(spec(5)?.schedule).toEqual(LIST[5]?.schedule);
	});

	it('gives the same devices from XLSX, with numbers as number cells', async () => {
		const file = await equipmentXlsx(LIST, 'Baseline: trial/1');
		const sheet = await parseEquipmentSheet(new Uint8Array(file), 'xlsx');
		if ('error' in sheet) throw new Error(sheet.error);
		expect(sheet.errors).toEqual([]);
		expect(sheet.devices.map((d) => d.spec)).toEqual(
			(await read(equipmentCsv(LIST))).devices.map((d) => d.spec)
		);
		const workbook = new ExcelJS.Workbook();
		await workbook.xlsx.load(file.buffer as ArrayBuffer);
		const ws = workbook.worksheets[0];
		expect(ws?.name).toBe('Baseline  trial 1');
		expect(ws?.getCell('D2').value).toBe(750);
	});

	it('neutralises text that a spreadsheet would run as a formula (OWASP CSV injection guidance)', () => {
		expect(equipmentCsv([{ ...LIST[0]!, name: '=HYPERLINK("http://example.org")' }])).toContain(
			`"'=HYPERLINK(""http://example.org"")"`
		);
	});

	it('offers a template whose invented rows all import', async () => {
		const sheet = await read(equipmentTemplateCsv());
		expect(sheet.errors).toEqual([]);
		expect(sheet.devices).toHaveLength(5);
	});
});

describe('a sheet with its own column names', () => {
	it('maps them by name, label or common alias', () => {
		const mapping = guessMapping([
			'Device',
			'Qty',
			'Power (W)',
			'Duty %',
			'Hours a day',
			'Schedule',
			'Remarks'
		]);
		expect(mapping).toMatchObject({
			name: 0,
			quantity: 1,
			watts: 2,
			duty_percent: 3,
			hours_per_day: 4,
			schedule: 5,
			notes: null
		});
	});

	it('reads the rows through a chosen mapping', async () => {
		const text = 'What,How many,W\nAir stone pump,3,35\n';
		const sheet = await parseEquipmentSheet(bytes(text), 'csv', {
			mapping: { name: 0, quantity: 1, watts: 2 }
		});
		if ('error' in sheet) throw new Error(sheet.error);
		expect(sheet.devices[0]?.spec).toMatchObject({
			name: 'Air stone pump',
			quantity: 3,
			power: { watts: 35 },
			schedule: { type: 'always' }
		});
		expect(sheet.preview[0]?.cells.watts).toBe('35');
	});

	it('asks for the name column when none is mapped', async () => {
		expect(await parseEquipmentSheet(bytes('a,b\n1,2\n'), 'csv')).toEqual({
			error: 'Choose which column holds the device names: every device needs a name'
		});
	});
});

describe('bad rows', () => {
	const header = 'name,watts,schedule,hours_per_day,windows,runs_per_day,minutes_per_run,quantity,months';
	it.each([
		['negative watts', 'P,-5,always', 'Row 2, watts: Watts must be zero or more'],
		['more than 24 hours a day', 'P,5,hours,25', 'Row 2, hours_per_day: Hours per day must be at most 24'],
		[
			'a window off the quarter hour',
			'P,5,windows,,06:10-08:00',
			'Row 2, windows: Window 1: Start must be on a quarter hour (:00, :15, :30 or :45)'
		],
		[
			'runs longer than their window',
			'P,5,runs,,06:00-07:00,4,30',
			'Row 2, schedule: 4 runs of 30 minutes (120 minutes) do not fit in the 60 minutes of the windows'
		],
		[
			'a comma decimal',
			'P,"0,5",always',
			'Row 2, watts: Watts must use a dot for decimals, like 0.12 (not 0,12)'
		],
		['a fractional quantity', 'P,5,always,,,,,1.5', 'Row 2, quantity: Quantity must be a whole number'],
		[
			'an unknown month',
			'P,5,always,,,,,,Smarch',
			'Row 2, months: Months: “smarch” is not a month or a range such as Apr-Sep or 4-9'
		],
		['no power', 'P,,always', 'Row 2, watts: Power is required']
	])('reports %s against its row and column', async (_, row, message) => {
		const sheet = await read(`${header}\n${row}\n`);
		expect(sheet.errors.map(describeRowError)).toContain(message);
		expect(sheet.devices).toEqual([]);
	});

	it('refuses a name used twice in the sheet or already in the list', async () => {
		const sheet = await read('name,watts\nPump,5\npump,6\nHeater,7\n', ['Heater']);
		expect(sheet.errors.map(describeRowError)).toEqual([
			'Row 3, name: Row 2 has this name; names must be unique',
			'Row 4, name: A device already in the list has this name; names must be unique'
		]);
	});
});

describe('month cells', () => {
	it.each([
		['Apr-Sep', [4, 5, 6, 7, 8, 9]],
		['Nov-Feb', [1, 2, 11, 12]],
		['1, 3; december', [1, 3, 12]],
		['June', [6]]
	])('reads %s', (text, months) => expect(readMonths(text)).toEqual({ months }));

	it('writes runs of three or more months as a range', () => {
		expect(writeMonths([4, 5, 6, 7, 8, 9, 12])).toBe('Apr-Sep, Dec');
		expect(writeMonths([1, 2, 11, 12])).toBe('Jan, Feb, Nov, Dec');
		expect(writeMonths(undefined)).toBe('');
	});
});
