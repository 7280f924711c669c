// What a save of a whole equipment list changed, device by device, for the change trail: the page and
// the API send the whole list back, so the untouched rows must be told apart from the edited ones.
import type { DeviceSpec } from '../db/schema';
import { type FieldChange, canonical, deviceChangeWords, fieldChanges } from './change-words';
import { deviceSpecSchema } from './device-specs';

/** One device's entry in the trail: added, removed, or changed with each field's old and new value. */
export type DeviceTrailEntry =
	| { action: 'added' | 'removed'; name: string; words: string; changes: null }
	| { action: 'changed'; name: string; words: string; changes: Record<string, FieldChange> };

/**
 * A device as the schema stores it, defaults filled and the flags as plain true/false, so a row saved
 * before a default existed, or whose keys jsonb reordered, compares equal to the same row sent again.
 */
function normal(spec: DeviceSpec): Record<string, unknown> {
	const parsed = deviceSpecSchema.safeParse(spec);
	const full = (parsed.success ? parsed.data : spec) as Record<string, unknown>;
	return {
		...full,
		inWater: !!full.inWater,
		outdoor: !!full.outdoor,
		notes: typeof full.notes === 'string' && full.notes.trim() ? full.notes : null
	};
}

const key = (spec: DeviceSpec) => spec.name.trim().toLowerCase();

/**
 * Pairs the rows before and after a save: by name first; then a row whose name is new takes the unpaired
 * old row of the same kind at its own position (a rename). Whatever is left was added or removed. Only pairs whose fields
 * differ are changed; moving rows is no change to a device.
 */
export function deviceTrail(before: DeviceSpec[], after: DeviceSpec[], currency: string): DeviceTrailEntry[] {
	const oldByName = new Map(before.map((spec, i) => [key(spec), i]));
	const paired = new Map<number, number>();
	after.forEach((spec, i) => {
		const old = oldByName.get(key(spec));
		if (old !== undefined) paired.set(i, old);
	});
	const taken = new Set(paired.values());
	const newNames = new Set(after.map(key));
	after.forEach((_, i) => {
		const old = before[i];
		if (paired.has(i) || !old || taken.has(i) || newNames.has(key(old))) return;
		if ((old.category ?? 'other') !== (after[i]!.category ?? 'other')) return;
		paired.set(i, i);
		taken.add(i);
	});
	const entries: DeviceTrailEntry[] = [];
	after.forEach((spec, i) => {
		const old = paired.get(i);
		if (old === undefined) {
			entries.push({ action: 'added', name: spec.name, words: `added ${spec.name}`, changes: null });
			return;
		}
		const changes = fieldChanges(normal(before[old]!), normal(spec));
		if (Object.keys(changes).length === 0) return;
		const name = before[old]!.name;
		entries.push({
			action: 'changed',
			name,
			words: `${name}: ${deviceChangeWords(changes, currency)}`,
			changes
		});
	});
	before.forEach((spec, i) => {
		if (!taken.has(i))
			entries.push({ action: 'removed', name: spec.name, words: `removed ${spec.name}`, changes: null });
	});
	return entries;
}

/** Whether only the order of the rows changed (same devices, same fields, another order). */
export const onlyReordered = (before: DeviceSpec[], after: DeviceSpec[]) =>
	before.length === after.length &&
	before.some((spec, i) => canonical(normal(spec)) !== canonical(normal(after[i]!)));
