import { calculate } from './calculate';
import { calculateRequestSchema, type CalculateRequestInput } from './request.schema';

/** The reference load the library prices every tariff with: 1 kW running all the time. */
export const REFERENCE_WATTS = 1000;

/**
 * What a typical month costs for the reference load: the calendar year's total for 1 kW always on,
 * divided by 12, so seasons and tiers average out. Used to compare tariffs at a glance.
 * Throws a ZodError when the tariff or the place is invalid (callers store only validated tariffs).
 */
export function referenceMonthlyCost(
	tariff: CalculateRequestInput['tariff'],
	timezone: string,
	holidays: CalculateRequestInput['holidays'],
	year: number
): number {
	const request = calculateRequestSchema.parse({
		period: { start: `${year}-01`, months: 12 },
		timezone,
		holidays,
		tariff,
		equipment: [
			{
				name: 'Reference load',
				category: 'other',
				quantity: 1,
				power: { watts: REFERENCE_WATTS },
				schedule: { type: 'always' }
			}
		]
	});
	return calculate(request).totals.cost / 12;
}
