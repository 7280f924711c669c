// Row-level edits of a scenario's equipment: each one rewrites the whole list through saveDevices, so the
// revision check, the list's rules and the audit trail are those of the whole-list PUT.
import type { z } from 'zod';
import type { RequestIssue } from '$lib/calc';
import type { DeviceSpec } from '$lib/server/db/schema';
import { listDevices, saveDevices } from './equipment.service';
import { StaleWrite } from './site.service';
import { equipmentListSchema } from './device-specs';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import type { Actor } from '../workspaces/audit';

/** The scenario being edited, its site and who edits. */
type ScenarioAccess = { site: SiteRow; scenario: ScenarioRow; user: Actor };

/** One row edit: add a device (at a position, or at the end), replace the one at a position, or remove it. */
export type RowEdit =
	| { kind: 'add'; device: DeviceSpec; position?: number }
	| { kind: 'replace'; device: DeviceSpec; position: number }
	| { kind: 'remove'; position: number };

/**
 * What came of a row edit: the new revision and the row's position, or why nothing was written — a
 * stale revision (`conflict`, the current one), the list's issues in the request's terms, or no device
 * at that position (`missing`).
 */
export type RowOutcome =
	| { ok: true; revision: number; position: number }
	| { ok: false; conflict: number }
	| { ok: false; issues: RequestIssue[] }
	| { ok: false; missing: true };

/** A device's place in the list, 0 for the first; anything else names no device. */
export function positionOf(param: string): number | null {
	return /^\d{1,6}$/.test(param) ? Number(param) : null;
}

const nameKey = (device: DeviceSpec) => device.name.trim().toLowerCase();

/**
 * The list schema's issues in the request's terms: those of the edited row (`at`) become `device.…`. The
 * schema flags the later of two rows with one name; when that is the other row, the edited one still
 * carries the issue, naming the row it clashes with.
 */
function asRowIssues(issues: z.core.$ZodIssue[], list: DeviceSpec[], at: number | null): RequestIssue[] {
	return issues.map((issue) => {
		const [root, index, ...rest] = issue.path;
		if (root !== 'devices') return { path: issue.path.map(String).join('.'), message: issue.message };
		if (typeof index !== 'number') return { path: '', message: issue.message };
		const edited = at === null ? undefined : list[at];
		if (rest[0] === 'name' && edited && nameKey(list[index]!) === nameKey(edited)) {
			const other = list.findIndex((d, i) => i !== at && nameKey(d) === nameKey(edited));
			return { path: 'device.name', message: `Another device (row ${other + 1}) has this name` };
		}
		const path = index === at ? ['device', ...rest] : issue.path;
		return { path: path.map(String).join('.'), message: issue.message };
	});
}

/**
 * Saves a whole equipment list (order included) if nobody saved since `expectedRevision`: the new
 * revision, or the current one as a conflict.
 */
export async function saveEquipment(
	{ site, scenario, user }: ScenarioAccess,
	expectedRevision: number,
	devices: DeviceSpec[]
): Promise<{ ok: true; revision: number } | { ok: false; conflict: number }> {
	try {
		return { ok: true, revision: await saveDevices(site, scenario, expectedRevision, devices, user) };
	} catch (e) {
		if (e instanceof StaleWrite) return { ok: false, conflict: e.currentRevision };
		throw e;
	}
}

/**
 * Applies one row edit to the stored list if `expectedRevision` is the scenario's: a stale caller hears
 * of the conflict first, since their idea of what sits at a position is out of date. The edited list is
 * checked by the whole list's rules and saved as a whole.
 */
export async function editEquipmentRow(
	access: ScenarioAccess,
	expectedRevision: number,
	edit: RowEdit
): Promise<RowOutcome> {
	if (expectedRevision !== access.scenario.revision) return { ok: false, conflict: access.scenario.revision };
	const list = (await listDevices(access.scenario.id)).map((d) => d.spec);
	const position = edit.position ?? list.length;
	if (edit.kind === 'add' && position > list.length)
		return {
			ok: false,
			issues: [{ path: 'position', message: `Position must be from 0 to ${list.length}` }]
		};
	if (edit.kind !== 'add' && position >= list.length) return { ok: false, missing: true };
	if (edit.kind === 'remove') list.splice(position, 1);
	else list.splice(position, edit.kind === 'add' ? 0 : 1, edit.device);
	const checked = equipmentListSchema.safeParse({ expectedRevision, devices: list });
	const at = edit.kind === 'remove' ? null : position;
	if (!checked.success) return { ok: false, issues: asRowIssues(checked.error.issues, list, at) };
	const saved = await saveEquipment(access, expectedRevision, checked.data.devices);
	return saved.ok ? { ...saved, position } : saved;
}
