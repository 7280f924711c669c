/** The export inputs the tests build from the invented comparisons, as the export route would. */
import { compare, type CompareRequestInput, compareRequestSchema, type EquipmentInput } from '$lib/calc';
import type { ComparisonExport } from './comparison-workbook';
import { hatcheryRequest } from './workbook-fixtures';
import { pump } from './workbook-tariffs';

/** A parsed request, its comparison and the export input the route would build for it. */
export function exportOf(input: CompareRequestInput, title: string): ComparisonExport {
	const request = compareRequestSchema.parse(input);
	return {
		title,
		generatedAt: '2026-12-02T09:30:00.000Z',
		request,
		response: compare(request),
		scenarios: request.scenarios.map((scenario, s) => ({
			siteName: title,
			tariffName: scenario.tariff
				? 'Demo Valley Power: own rate (invented)'
				: 'Demo Valley Power: standard rate (invented)',
			tariffVersion: s === 0 ? 3 : null,
			tariffOrigin: {
				utility: 'Demo Valley Power (invented)',
				effectiveFrom: scenario.tariff ? '2026-07-01' : '2026-01-01',
				effectiveTo: scenario.tariff ? '2027-06-30' : null,
				source: scenario.tariff
					? 'Own rate sheet (invented)'
					: 'https://demo-valley.example.org/rates (invented)',
				checkedOn: '2026-11-20',
				urdbLabel: scenario.tariff ? null : '5cd0000000000000000demo'
			}
		})),
		emissionSource: 'Example value, not a published factor',
		cautions: [
			'Mains-powered equipment in or near water can kill: use ground-fault protection (invented test caution).'
		]
	};
}

/**
 * A large comparison for the speed test: 6 scenarios × 200 devices drawn from the hatchery's
 * equipment, with a seventh of them on an hours-a-day schedule of their own length (many schedules).
 */
export function largeExport(): ComparisonExport {
	const base = hatcheryRequest();
	const templates = base.scenarios.flatMap((scenario) => scenario.equipment);
	const scenarios = Array.from({ length: 6 }, (_, s) => ({
		name: `Option ${s + 1}`,
		equipment: Array.from({ length: 200 }, (_, d): EquipmentInput => {
			const template = templates[(d + s) % templates.length] ?? pump();
			const own = d % 7 === 0 ? { schedule: { type: 'hours' as const, hoursPerDay: 4 + d / 20 } } : {};
			return { ...template, name: `Device ${d + 1}`, quantity: 1 + (d % 3), ...own };
		})
	}));
	return exportOf({ ...base, scenarios }, 'Large demo comparison (invented)');
}
