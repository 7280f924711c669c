import { type SheetKind, readSheet } from '$lib/server/sheets/read-sheet';
import type { DeviceSpec } from '$lib/server/db/schema';
import { type ColumnMapping, EQUIPMENT_COLUMNS, guessMapping } from './columns';
import { type RowError, rowToSpec } from './rows';

export const MAX_EQUIPMENT_ROWS = 2000;
const PREVIEW_ROWS = 8;

export interface EquipmentSheet {
	/** The sheet's own header cells, for the column mapping. */
	header: string[];
	mapping: ColumnMapping;
	/** The first rows as the mapping reads them: field → cell text. */
	preview: { line: number; cells: Record<string, string> }[];
	devices: { line: number; spec: DeviceSpec }[];
	errors: RowError[];
	rowCount: number;
}

/** "Row 4, watts: Watts must be zero or more". */
export const describeRowError = (error: RowError) => `Row ${error.line}, ${error.field}: ${error.message}`;

/**
 * Reads an equipment sheet with a column mapping (or the one its header suggests) into checked
 * devices and row-level errors, naming each error by the sheet's row number and the field. Device
 * names must be unique within the sheet and against `takenNames` (the list it is added to).
 */
export async function parseEquipmentSheet(
	bytes: Uint8Array,
	kind: SheetKind,
	options: { mapping?: ColumnMapping; takenNames?: readonly string[] } = {}
): Promise<EquipmentSheet | { error: string }> {
	const table = await readSheet(bytes, kind, { maxRows: MAX_EQUIPMENT_ROWS, rowWord: 'device' });
	if ('error' in table) return table;
	const header = table.header.cells;
	const mapping = options.mapping ?? guessMapping(header);
	if (mapping.name == null) {
		return { error: 'Choose which column holds the device names: every device needs a name' };
	}
	const cellsOf = (cells: string[]) =>
		Object.fromEntries(
			EQUIPMENT_COLUMNS.map(({ field }) => {
				const index = mapping[field];
				return [field, index == null ? '' : (cells[index] ?? '')];
			})
		);
	const sheet: EquipmentSheet = {
		header,
		mapping,
		preview: table.body.slice(0, PREVIEW_ROWS).map(({ line, cells }) => ({ line, cells: cellsOf(cells) })),
		devices: [],
		errors: [],
		rowCount: table.body.length
	};
	const names = new Map((options.takenNames ?? []).map((name) => [name.trim().toLowerCase(), 0]));
	for (const { line, cells } of table.body) {
		const row = cellsOf(cells);
		const read = rowToSpec(line, (field) => row[field] ?? '');
		if ('errors' in read) {
			sheet.errors.push(...read.errors);
			continue;
		}
		const key = read.spec.name.trim().toLowerCase();
		const earlier = names.get(key);
		if (earlier !== undefined) {
			const where = earlier === 0 ? 'A device already in the list' : `Row ${earlier}`;
			sheet.errors.push({ line, field: 'name', message: `${where} has this name; names must be unique` });
			continue;
		}
		names.set(key, line);
		sheet.devices.push({ line, spec: read.spec });
	}
	return sheet;
}
