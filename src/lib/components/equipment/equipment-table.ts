import { z } from 'zod';
import { amount, type EquipmentInput, equipmentSchema, parseRequest, powerSchema } from '$lib/calc';
import { type FieldIssue, messagesAt } from '$lib/components/fields/field-issues';
import { powerForm, writeField } from './device-fields';

/** A stored device: the core's Equipment plus the safety flags and notes (as `devices.spec` holds it). */
export type DeviceSpec = EquipmentInput & {
	inWater?: boolean;
	outdoor?: boolean;
	notes?: string;
	/** What one unit delivers, when known: a water pump's flow, an air pump's free air (L/min). */
	waterLpm?: number;
	airLpm?: number;
	fromAirDesign?: boolean;
};

/** What one unit delivers, checked as the server's device schema checks it (optional, 0 or more). */
const deliverySchema = z.object({
	waterLpm: amount('Water moved', { min: 0, max: 10_000_000 }).optional(),
	airLpm: amount('Air delivered', { min: 0, max: 10_000_000 }).optional()
});

function deliveryIssues(spec: DeviceSpec): FieldIssue[] {
	const result = parseRequest(deliverySchema, { waterLpm: spec.waterLpm, airLpm: spec.airLpm });
	return result.success ? [] : result.error.issues;
}

/** One row of the table; `key` stays with the device through moves (a database id or a client uuid). */
export interface EquipmentRow {
	key: string;
	spec: DeviceSpec;
}

/** A problem at a dotted path: relative to a device in a row, or "3.power.amps" across the table. */
export type { FieldIssue };

/** What "Add a device" puts in: one 100 W water pump, always on — valid before anything is typed. */
export function blankDevice(): DeviceSpec {
	return {
		name: 'Water pump',
		category: 'water-pump',
		quantity: 1,
		power: { watts: 100 },
		standbyWatts: 0,
		dutyPercent: 100,
		schedule: { type: 'always' },
		purchaseCost: 0,
		installCost: 0,
		lifeYears: null,
		maintenancePerYear: 0
	};
}

/**
 * Every problem with one device, at paths relative to it ("power.amps"). Power is checked against the
 * form the row shows (watts, or amps × volts): the schema's union alone cannot tell which form a
 * half-filled power meant, and would name the other form's missing field.
 */
export function rowIssues(spec: DeviceSpec): FieldIssue[] {
	const result = parseRequest(equipmentSchema, spec);
	const issues = [...(result.success ? [] : result.error.issues), ...deliveryIssues(spec)];
	const power: unknown = spec.power;
	if (power === null || typeof power !== 'object') return issues;
	const branch = powerSchema.options[powerForm(power) === 'amps' ? 1 : 0].safeParse(power);
	const others = issues.filter((issue) => issue.path !== 'power' && !issue.path.startsWith('power.'));
	if (branch.success) return others;
	const powerIssues = branch.error.issues.map((issue) => ({
		path: ['power', ...issue.path].join('.'),
		message: issue.message
	}));
	return [...powerIssues, ...others];
}

/** Every problem of the table, each path led by its row's index ("3.power.amps"), rows in order. */
export function allIssues(rows: readonly EquipmentRow[]): FieldIssue[] {
	return rows.flatMap((row, i) =>
		rowIssues(row.spec).map((issue) => ({
			path: issue.path ? `${i}.${issue.path}` : `${i}`,
			message: issue.message
		}))
	);
}

/**
 * Table-wide issues (from the server: "3.power.amps", or "equipment.3.power.amps") sorted into rows,
 * with paths made relative to the device. Issues that name no row are kept under -1.
 */
export function issuesByRow(issues: readonly FieldIssue[]): Map<number, FieldIssue[]> {
	const byRow = new Map<number, FieldIssue[]>();
	for (const issue of issues) {
		const match = /^(?:equipment\.)?(\d+)(?:\.(.*))?$/.exec(issue.path);
		const row = match ? Number(match[1]) : -1;
		const path = match ? (match[2] ?? '') : issue.path;
		const list = byRow.get(row) ?? [];
		list.push({ path, message: issue.message });
		byRow.set(row, list);
	}
	return byRow;
}

/** The rows with one moved by `delta` places (−1 up, +1 down); unchanged at either end. */
export function moveRow<T>(rows: readonly T[], index: number, delta: number): T[] {
	const target = index + delta;
	const moved = rows[index];
	if (moved === undefined || target < 0 || target >= rows.length) return [...rows];
	const next = rows.filter((_, i) => i !== index);
	next.splice(target, 0, moved);
	return next;
}

/** The rows with a copy of one (its own key, "(copy)" after its name) right below it. */
export function duplicateRow(rows: readonly EquipmentRow[], index: number, key: string): EquipmentRow[] {
	const original = rows[index];
	if (!original) return [...rows];
	// Devices are JSON data (they are stored as jsonb), so a JSON round trip is a full, detached copy.
	const spec = JSON.parse(JSON.stringify(original.spec)) as DeviceSpec;
	if (typeof spec.name === 'string') spec.name = `${spec.name} (copy)`.slice(0, 120);
	return [...rows.slice(0, index + 1), { key, spec }, ...rows.slice(index + 1)];
}

/** The rows without one. */
export function removeRow<T>(rows: readonly T[], index: number): T[] {
	return rows.filter((_, i) => i !== index);
}

/** The rows with one put back at its place (an undone delete). */
export function insertRow<T>(rows: readonly T[], index: number, row: T): T[] {
	const at = Math.max(0, Math.min(index, rows.length));
	return [...rows.slice(0, at), row, ...rows.slice(at)];
}

/** A device's name for buttons and announcements: its name, or "device 3" while the name is empty. */
export function deviceLabel(spec: DeviceSpec, index: number): string {
	const name = typeof spec.name === 'string' ? spec.name.trim() : '';
	return name || `device ${index + 1}`;
}

/** A key for a row made in the browser, before the database gives it an id. */
export function clientKey(): string {
	if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
	// randomUUID exists only in secure contexts; a page opened over plain http on a farm's LAN has not.
	return `row-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}

/** The element id prefix for a row's controls; keys may hold characters ids should not. */
export function rowDomId(key: string): string {
	return `eq-${key.replace(/[^A-Za-z0-9_-]/g, '_')}`;
}

/** The id of the control for a path inside a row: ("eq-7", "power.amps") → "eq-7-power-amps". */
export function fieldId(rowId: string, path: string): string {
	return path ? `${rowId}-${path.replaceAll('.', '-')}` : rowId;
}

/**
 * What a figure box of a device's power or schedule (`path` "power" or "schedule") needs: its id, value,
 * writer and messages, all following from the part and the key, so both editors build their boxes alike.
 */
export function partNumber(
	part: object,
	path: string,
	rowId: string,
	issues: readonly FieldIssue[],
	key: string
) {
	return {
		id: fieldId(rowId, `${path}.${key}`),
		value: (part as Record<string, number | undefined>)[key],
		onvalue: (next: number | undefined) => writeField(part, key, next),
		messages: messagesAt(issues, `${path}.${key}`)
	};
}
