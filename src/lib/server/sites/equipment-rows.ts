// Row-level edits of a scenario's equipment: each one rewrites the whole list through saveDevices, so the
// revision check, the list's rules and the audit trail are those of the whole-list PUT.
import type { z } from 'zod';
import type { RequestIssue } from '$lib/calc';
import type { requireScenarioAccess } from '$lib/server/guard';
import type { DeviceSpec } from '$lib/server/db/schema';
import { saveDevices } from '$lib/server/sites/equipment.service';
import { StaleWrite } from '$lib/server/sites/site.service';
import { equipmentListSchema } from '$lib/server/sites/device-specs';
import { conflict, invalid } from '$lib/server/http/answers';

type ScenarioAccess = Awaited<ReturnType<typeof requireScenarioAccess>>;

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
 * Saves `list` (the stored list with one row added, replaced or removed at `at`) if nobody saved since
 * `expectedRevision`. Answers the new revision, or the 400 or 409 response to send.
 */
export async function writeList(
	{ site, scenario, user }: ScenarioAccess,
	expectedRevision: number,
	list: DeviceSpec[],
	at: number | null
): Promise<{ ok: true; revision: number } | { ok: false; response: Response }> {
	const checked = equipmentListSchema.safeParse({ expectedRevision, devices: list });
	if (!checked.success) return { ok: false, response: invalid(asRowIssues(checked.error.issues, list, at)) };
	try {
		const revision = await saveDevices(site, scenario, expectedRevision, checked.data.devices, user);
		return { ok: true, revision };
	} catch (e) {
		if (e instanceof StaleWrite) return { ok: false, response: conflict(e.currentRevision) };
		throw e;
	}
}
