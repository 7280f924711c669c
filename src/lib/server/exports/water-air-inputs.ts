import { designAir, designConditions, type AirDesign, type SiteWater } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import type { WaterAirScenario } from './water-air-sheet';

/**
 * The "Water and air" sheet's input for each compared scenario: its delivery (already in the report),
 * its site's tank volume, and its air design worked out again by the core for the design's tank (the
 * same call the designer makes), so the sheet's values are the designer's.
 */
export function waterAirScenarios(
	report: ComparisonReport,
	stored: readonly { airDesign: AirDesign | null; water: SiteWater }[]
): WaterAirScenario[] {
	return report.scenarios.map((s, i) => {
		const { airDesign, water } = stored[i] ?? { airDesign: null, water: { altitudeM: 0, tanks: [] } };
		// The volume the core's turnovers use: the aerated tank's when the design names one, else all tanks.
		const tankConditions = designConditions(water, airDesign?.aeration?.tankId ?? null);
		const volume = tankConditions.tankVolumeLiters ?? 0;
		const conditions = airDesign ? tankConditions : null;
		return {
			name: s.name,
			delivery: s.delivery,
			tankVolumeLiters: volume > 0 ? volume : null,
			design:
				airDesign && conditions
					? { design: airDesign, conditions, result: designAir(airDesign, conditions) }
					: null
		};
	});
}
