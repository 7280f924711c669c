import {
	amount,
	distinctBy,
	holidaysSchema,
	parseRequest,
	type Tariff,
	tariffSchema,
	timezoneSchema
} from '$lib/calc';
import {
	CUSTOMER_CLASSES,
	type TariffMeta,
	type VersionMeta,
	tariffMetaSchema,
	versionMetaSchema
} from '$lib/forms/tariff-meta.schema';
import {
	type Grid,
	type SheetKind,
	MAX_SHEET_BYTES,
	numberCell,
	readSheet
} from '$lib/server/sheets/read-sheet';
import { MAX_SHEET_ROWS, MAX_TIERS, NUMBERS, TARIFF_SHEET_COLUMNS } from './sheet-columns';

export { MAX_SHEET_BYTES, MAX_SHEET_ROWS };

/**
 * The batch import sheet: one row per tariff version of a flat or tiered tariff, as CSV or as the
 * first worksheet of an XLSX workbook. Cells are trimmed and otherwise taken as they are; rows are
 * checked with the same schemas as the editor and the API. Nothing here touches the database.
 */

export interface SheetRow {
	/** The row number a person sees in the sheet; the header is row 1 when it is the first row. */
	line: number;
	meta: TariffMeta;
	version: VersionMeta;
	structure: Tariff;
}
export interface SheetRowError {
	line: number;
	/** A column name, or "row" for the row as a whole. */
	field: string;
	message: string;
}
export interface SheetResult {
	rows: SheetRow[];
	errors: SheetRowError[];
	sheetErrors: string[];
}

/** "Row 4, energy_per_kwh: Energy per kWh must be zero or more". */
export function describeRowError(error: SheetRowError): string {
	return `Row ${error.line}, ${error.field}: ${error.message}`;
}

/** Column name → cell index, or the sheet-level errors of the header. */
function headerOf(header: string[], body: Grid): { index: Map<string, number> } | { errors: string[] } {
	const known = new Set(TARIFF_SHEET_COLUMNS.map((c) => c.name));
	const names = header.map((cell) => cell.trim().toLowerCase());
	const index = new Map<string, number>();
	const errors: string[] = [];
	names.forEach((name, i) => {
		if (name === '') {
			const used = body.some((row) => (row.cells[i] ?? '') !== '');
			if (used) errors.push(`Column ${i + 1} has cells but no name in the header row`);
		} else if (index.has(name)) errors.push(`Column “${name}” appears more than once`);
		else index.set(name, i);
	});
	const extra = body.find((row) => row.cells.slice(names.length).some((cell) => cell !== ''));
	if (extra) errors.push(`Row ${extra.line} has more cells than the header row has columns`);
	const unknown = [...index.keys()].filter((name) => !known.has(name));
	if (unknown.length) {
		errors.push(`Unknown columns: ${unknown.join(', ')} (the format lists the columns a sheet can have)`);
	}
	const missing = TARIFF_SHEET_COLUMNS.filter((c) => c.required && !index.has(c.name)).map((c) => c.name);
	if (missing.length) errors.push(`Missing required columns: ${missing.join(', ')}`);
	return errors.length ? { errors } : { index };
}

type Cell = (name: string) => string;
type Fail = (field: string, message: string) => void;
type Issues = { path: string; message: string }[];

function numberReader(cell: Cell, fail: Fail) {
	return (name: string): number | null => {
		const raw = cell(name);
		const spec = NUMBERS[name];
		if (raw === '' || !spec) return null;
		const read = numberCell(raw, spec.label);
		if ('message' in read) {
			fail(name, read.message);
			return null;
		}
		const checked = amount(spec.label, spec.bounds).safeParse(read.value);
		if (checked.success) return checked.data;
		fail(name, checked.error.issues[0]?.message ?? `${spec.label} is not a valid number`);
		return null;
	};
}

/** The row's holiday rule; undefined when it was refused. */
function holidayRule(cell: Cell, fail: Fail): TariffMeta['holidays'] | undefined {
	const country = cell('holiday_country');
	const region = cell('holiday_region');
	if (country === '' && region === '') return null;
	if (country === '') return void fail('holiday_region', 'Give holiday_country together with holiday_region');
	const parsed = parseRequest(holidaysSchema, region === '' ? { country } : { country, region });
	if (parsed.success) return parsed.data;
	for (const issue of parsed.error.issues) {
		fail(issue.path === 'region' ? 'holiday_region' : 'holiday_country', issue.message);
	}
	return undefined;
}

function tiersOf(cell: Cell, numberAt: (name: string) => number | null, fail: Fail) {
	const filled: number[] = [];
	for (let n = 1; n <= MAX_TIERS; n++) {
		if (cell(`tier${n}_upto_kwh`) !== '' || cell(`tier${n}_per_kwh`) !== '') filled.push(n);
	}
	return filled.map((n, i) => {
		const upto = `tier${n}_upto_kwh`;
		const last = i === filled.length - 1;
		if (n !== i + 1) {
			fail(`tier${n}_per_kwh`, `Tier ${n} follows an empty tier ${i + 1}; fill the tiers in order`);
		}
		if (cell(`tier${n}_per_kwh`) === '') fail(`tier${n}_per_kwh`, `Tier ${n} per kWh is required`);
		if (last && cell(upto) !== '') {
			fail(upto, `Leave the last tier’s upto_kwh empty: the last tier covers all kWh above the one before`);
		} else if (!last && cell(upto) === '') {
			fail(upto, `Tier ${n} up to kWh is required: only the last tier is open-ended`);
		}
		return { uptoKwh: numberAt(upto), perKwh: numberAt(`tier${n}_per_kwh`) ?? 0 };
	});
}

/** The Tariff input a row describes, and which column each part of it came from. */
function structureOf(cell: Cell, fail: Fail) {
	const numberAt = numberReader(cell, fail);
	const fields = new Map<string, string>([['currency', 'currency']]);
	const fixedCharges: object[] = [];
	for (const [name, key] of [
		['customer_charge_per_month', 'perMonth'],
		['customer_charge_per_day', 'perDay']
	] as const) {
		const value = numberAt(name);
		if (value === null) continue;
		fields.set(`fixedCharges.${fixedCharges.length}`, name);
		fixedCharges.push({ label: 'Customer charge', [key]: value });
	}
	const flat = numberAt('energy_per_kwh');
	const tiers = tiersOf(cell, numberAt, fail);
	const flatGiven = cell('energy_per_kwh') !== '';
	if (flatGiven && tiers.length) fail('energy_per_kwh', 'Give energy_per_kwh or tiers, not both');
	if (!flatGiven && !tiers.length) {
		fail('energy_per_kwh', 'Give energy_per_kwh for a flat tariff, or tier1_per_kwh and on for a tiered one');
	}
	fields.set('energyCharges', 'energy_per_kwh');
	tiers.forEach((_, i) => {
		fields.set(`energyCharges.0.tiers.${i}.uptoKwh`, `tier${i + 1}_upto_kwh`);
		fields.set(`energyCharges.0.tiers.${i}.perKwh`, `tier${i + 1}_per_kwh`);
	});
	const labelled = (prefix: 'rider' | 'tax', amountColumn: string, key: string, fallback: string) => {
		const value = numberAt(amountColumn);
		const label = cell(`${prefix}_label`);
		if (label !== '' && cell(amountColumn) === '') {
			fail(amountColumn, `Give ${amountColumn} with ${prefix}_label`);
		}
		const path = prefix === 'rider' ? 'riders' : 'taxes';
		fields.set(path, amountColumn).set(`${path}.0.label`, `${prefix}_label`);
		return value === null ? [] : [{ label: label || fallback, [key]: value }];
	};
	fields.set('minimumMonthly', 'minimum_monthly');
	return {
		fields,
		input: {
			currency: cell('currency'),
			fixedCharges,
			energyCharges: [
				flatGiven
					? { label: 'Energy', type: 'flat', perKwh: flat ?? 0 }
					: { label: 'Energy', type: 'tiered', tiers }
			],
			riders: labelled('rider', 'rider_per_kwh', 'perKwh', 'Rider'),
			taxes: labelled('tax', 'tax_percent', 'percent', 'Tax'),
			minimumMonthly: numberAt('minimum_monthly')
		}
	};
}

/** The column a schema issue belongs to: the longest recorded path that contains it. */
function fieldOfPath(fields: Map<string, string>, path: string): string {
	let best = '';
	for (const key of fields.keys()) {
		if ((path === key || path.startsWith(`${key}.`)) && key.length > best.length) best = key;
	}
	return fields.get(best) ?? 'row';
}

const snake = (path: string) => (path.split('.')[0] ?? '').replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const CLASS_MESSAGE = `Customer class must be one of: ${CUSTOMER_CLASSES.join(', ')}`;
const META_COLUMNS = 'utility name code country region area currency timezone description'.split(' ');

function parseRow(line: number, cell: Cell): { row: SheetRow } | { errors: SheetRowError[] } {
	const errors: SheetRowError[] = [];
	const fail: Fail = (field, message) => void errors.push({ line, field, message });
	const report = (issues: Issues, fieldOf: (path: string) => string) =>
		issues.forEach((issue) => fail(fieldOf(issue.path), issue.message));

	const holidays = holidayRule(cell, fail);
	const meta = parseRequest(tariffMetaSchema, {
		...Object.fromEntries(META_COLUMNS.map((name) => [name, cell(name)])),
		// "Small commercial" in a sheet means the class small-commercial.
		customerClass: cell('customer_class').toLowerCase().replace(/\s+/g, '-'),
		holidays: holidays ?? null
	});
	if (!meta.success) {
		for (const issue of meta.error.issues) {
			if (issue.path === 'customerClass') fail('customer_class', CLASS_MESSAGE);
			else fail(snake(issue.path), issue.message);
		}
	}
	// An empty time zone is already reported as required by the metadata schema.
	const zone = timezoneSchema.safeParse(cell('timezone'));
	if (cell('timezone') !== '' && !zone.success) fail('timezone', zone.error.issues[0]?.message ?? '');
	const version = parseRequest(versionMetaSchema, {
		effectiveFrom: cell('effective_from'),
		effectiveTo: cell('effective_to') || null,
		source: cell('source'),
		checkedOn: cell('checked_on'),
		changeNote: cell('change_note')
	});
	if (!version.success) report(version.error.issues, snake);

	const before = errors.length;
	const built = structureOf(cell, fail);
	// Cell errors already say what is wrong; the schema would only repeat them less clearly.
	const structure = errors.length === before ? parseRequest(tariffSchema, built.input) : undefined;
	if (structure?.success === false) {
		report(structure.error.issues, (path) => fieldOfPath(built.fields, path));
	}

	if (errors.length || !meta.success || !version.success || !structure?.success || holidays === undefined) {
		return { errors: dedupe(errors) };
	}
	return {
		row: { line, meta: { ...meta.data, holidays }, version: version.data, structure: structure.data }
	};
}

// The currency cell feeds both the metadata and the charges; say each problem once.
const dedupe = (errors: SheetRowError[]) => distinctBy(errors, (e) => `${e.field}\u0000${e.message}`);

const versionKey = ({ meta, version }: SheetRow) =>
	[meta.utility, meta.code ?? meta.name, version.effectiveFrom].join('|').toLowerCase();

/**
 * Reads a batch import sheet into checked rows. Bad rows are reported with their row number and
 * column; a sheet that cannot be read at all (empty, too big, not a sheet, wrong columns) gives
 * sheet-level errors and no rows. Never throws for bad input.
 */
export async function parseTariffSheet(bytes: Uint8Array, kind: SheetKind): Promise<SheetResult> {
	const refuse = (...sheetErrors: string[]): SheetResult => ({ rows: [], errors: [], sheetErrors });
	const table = await readSheet(bytes, kind, { maxRows: MAX_SHEET_ROWS, rowWord: 'tariff' });
	if ('error' in table) return refuse(table.error);
	const { header, body } = table;
	const columns = headerOf(header.cells, body);
	if ('errors' in columns) return refuse(...columns.errors);

	const result: SheetResult = { rows: [], errors: [], sheetErrors: [] };
	const seen = new Map<string, number>();
	for (const { line, cells } of body) {
		const parsed = parseRow(line, (name) => cells[columns.index.get(name) ?? -1] ?? '');
		if ('errors' in parsed) {
			result.errors.push(...parsed.errors);
			continue;
		}
		const key = versionKey(parsed.row);
		const earlier = seen.get(key);
		if (earlier === undefined) {
			seen.set(key, line);
			result.rows.push(parsed.row);
		} else {
			const from = parsed.row.version.effectiveFrom;
			result.errors.push({
				line,
				field: 'effective_from',
				message: `Row ${earlier} already gives this tariff a version from ${from}`
			});
		}
	}
	return result;
}
