import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import type { DeviceSpec } from '$lib/server/db/schema';
import { neutraliseFormula } from '$lib/server/exports/safe-text';
import { EQUIPMENT_COLUMNS } from './columns';
import { specToRow } from './rows';

/** The equipment sheet written out: the same columns the import reads, so an export imports back. */
const FIELDS = EQUIPMENT_COLUMNS.map((c) => c.field);
const TEXT_FIELDS = new Set(['name', 'notes']);

const cellsOf = (spec: DeviceSpec) => {
	const row = specToRow(spec);
	return FIELDS.map((field) => {
		const value = row[field] ?? '';
		return TEXT_FIELDS.has(field) && typeof value === 'string' ? neutraliseFormula(value) : value;
	});
};

export function equipmentCsv(specs: readonly DeviceSpec[]): string {
	return `${Papa.unparse({ fields: FIELDS, data: specs.map(cellsOf) })}\r\n`;
}

export async function equipmentXlsx(specs: readonly DeviceSpec[], sheetTitle: string): Promise<Buffer> {
	const workbook = new ExcelJS.Workbook();
	workbook.creator = 'Runrate';
	const sheet = workbook.addWorksheet(sheetTitle.replace(/[*?:\\/[\]]/g, ' ').slice(0, 31) || 'Equipment', {
		views: [{ state: 'frozen', ySplit: 1 }]
	});
	sheet.columns = EQUIPMENT_COLUMNS.map((c) => ({
		header: c.field,
		key: c.field,
		width: Math.max(10, Math.min(40, c.field.length + 4))
	}));
	sheet.getRow(1).font = { bold: true };
	for (const spec of specs) sheet.addRow(cellsOf(spec));
	sheet.getColumn('name').width = 28;
	sheet.getColumn('notes').width = 40;
	return Buffer.from(await workbook.xlsx.writeBuffer());
}

/** Invented example devices for the template: one of each power form and schedule kind. */
const TEMPLATE: DeviceSpec[] = [
	{
		name: 'Sump pump (example)',
		category: 'water-pump',
		power: { watts: 450 },
		schedule: { type: 'always' },
		inWater: true,
		purchaseCost: 380,
		lifeYears: 6
	},
	{
		name: 'Air pump (example)',
		category: 'air-pump',
		quantity: 2,
		power: { amps: 0.9, volts: 120, powerFactor: 0.85 },
		schedule: { type: 'always' }
	},
	{
		name: 'Grow lights (example)',
		category: 'lighting',
		quantity: 6,
		power: { watts: 220 },
		schedule: { type: 'windows', windows: [{ start: '05:00', end: '21:00' }], days: 'all' },
		months: [10, 11, 12, 1, 2, 3]
	},
	{
		name: 'Tank heater (example)',
		category: 'heater',
		power: { watts: 800 },
		dutyPercent: 35,
		schedule: { type: 'hours', hoursPerDay: 24, days: 'all' },
		months: [11, 12, 1, 2, 3],
		inWater: true
	},
	{
		name: 'Drum filter flush (example)',
		category: 'water-pump',
		power: { watts: 250 },
		schedule: { type: 'runs', runsPerDay: 12, minutesPerRun: 2, days: 'all' },
		notes: 'Invented template row'
	}
];

export const equipmentTemplateCsv = () => equipmentCsv(TEMPLATE);
