import type { DeviceSpec } from '../db/schema';

const UNLISTED = 'Load not in the list';

/**
 * The list scaled to the bill's kWh: a shortfall becomes an always-on device of the missing watts; a
 * surplus scales every device's duty down by the same share. The tariff then prices that load, so the
 * recomputed bill follows the list's time-of-use shape.
 */
export function scaledToBill(
	specs: DeviceSpec[],
	estimatedKwh: number,
	billedKwh: number,
	hours: number
): DeviceSpec[] {
	if (billedKwh >= estimatedKwh) {
		const watts = ((billedKwh - estimatedKwh) / hours) * 1000;
		return watts > 0
			? [...specs, { name: UNLISTED, category: 'other', power: { watts }, schedule: { type: 'always' } }]
			: specs;
	}
	const share = estimatedKwh > 0 ? billedKwh / estimatedKwh : 0;
	return specs.map((spec) => ({ ...spec, dutyPercent: (spec.dutyPercent ?? 100) * share }));
}
