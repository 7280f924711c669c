// The equipment row the air designer owns: its pumps, always on and out of the water, named so that no
// other device of the list shares the name, and put where the last design's row stood.
import type { PumpSelection } from '$lib/calc';
import { figure } from '$lib/text/numbers';
import type { DeviceSpec } from '../db/schema';

/** A device name's longest (the equipment schema's). */
const NAME_MAX = 120;

/** A name for the pumps' row that no other device of the list has ("Air pump (air design 2)"). */
export function uniqueName(name: string, others: readonly DeviceSpec[]): string {
	const taken = new Set(others.map((d) => d.name.trim().toLowerCase()));
	for (let n = 1; ; n++) {
		const suffix = n === 1 ? '' : ` (air design${n === 2 ? '' : ` ${n - 1}`})`;
		const candidate = `${name.slice(0, NAME_MAX - suffix.length)}${suffix}`;
		if (!taken.has(candidate.trim().toLowerCase())) return candidate;
	}
}

/** The equipment row for the chosen pumps: always on, out of the water, its free air per unit. */
export function airPumpRow(selection: PumpSelection, others: readonly DeviceSpec[]): DeviceSpec {
	return {
		name: uniqueName(selection.pumpName, others),
		category: 'air-pump',
		quantity: selection.count,
		power: { watts: selection.wattsEach },
		schedule: { type: 'always' },
		inWater: false,
		airLpm: selection.flowEachLpm,
		fromAirDesign: true
	} as DeviceSpec;
}

/** The list with the designer's row in place of its old one (where it stood), or added at the end. */
export function withAirPumpRow(list: readonly DeviceSpec[], selection: PumpSelection): DeviceSpec[] {
	const at = list.findIndex((d) => d.fromAirDesign);
	const others = list.filter((d) => !d.fromAirDesign);
	const row = airPumpRow(selection, others);
	if (at < 0) return [...others, row];
	const before = list.slice(0, at).filter((d) => !d.fromAirDesign);
	return [...before, row, ...others.slice(before.length)];
}

/** The trail's words: "Air design saved: 2 × Linear pump 60 L/min class, 45 W each". */
export const airDesignWords = (selection: PumpSelection) =>
	`Air design saved: ${selection.count} × ${selection.pumpName}, ${figure(selection.wattsEach, 1)} W each`;
