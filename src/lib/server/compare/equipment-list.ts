import { type Equipment, type PeriodResult, unitWatts } from '$lib/calc';
import type { ComparedDevice } from '$lib/compare/types';
import { activeMonthsText, categoryWords, scheduleText } from '$lib/server/exports/device-words';

/**
 * A scenario's equipment as the comparison's readers see it: what each device is, how much of it,
 * when it runs, and its year's kWh and share of the bill (from the compared periods, devices in
 * request order), so a reviewer can see where each total comes from.
 */
export function equipmentList(
	equipment: readonly Equipment[],
	periods: readonly PeriodResult[]
): ComparedDevice[] {
	return equipment.map((device, d) => {
		const months = activeMonthsText(device.months);
		return {
			name: device.name,
			category: categoryWords(device.category),
			quantity: device.quantity,
			wattsPerUnit: unitWatts(device.power),
			schedule:
				months === 'all year' ? scheduleText(device.schedule) : `${scheduleText(device.schedule)}; ${months}`,
			kwhPerYear: periods.reduce((sum, p) => sum + (p.equipment[d]?.kwh ?? 0), 0),
			costPerYear: periods.reduce((sum, p) => sum + (p.equipment[d]?.cost ?? 0), 0)
		};
	});
}
