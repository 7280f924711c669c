import type { ComparedScenario, ComparisonQuery } from '$lib/compare/types';

/** The choices and rules behind a comparison, in sentences a grant reviewer can check. */
export function assumptionsOf(
	query: ComparisonQuery,
	scenarios: ComparedScenario[],
	zones: string[],
	zone: string
): string[] {
	const lines = [
		`The year compared is the 12 calendar months from ${query.start}, each billed as one period.`,
		...scenarios.map(
			(s) =>
				`“${s.name}” is priced on ${s.tariffName}, version ${s.tariffVersion} (the version in force on the first day).`
		),
		`Clock times, weekends and public holidays follow the time zone ${zone} of the baseline’s site${
			new Set(zones).size > 1 ? '; scenarios of sites in other time zones are counted in it too' : ''
		}.`,
		`Energy costs rise ${query.escalationPercent} % a year; future costs are discounted at ${query.discountPercent} % a year over ${query.horizonYears} years; year 0 is the purchase and installation.`,
		'Each device is bought again at the end of its stated life within the horizon (installation is not repeated); maintenance is paid every year.',
		'Simple payback is the extra purchase and installation cost over the baseline divided by the yearly saving.',
		query.emissionKgPerKwh > 0
			? `CO₂ is the year’s kWh × ${query.emissionKgPerKwh} kg per kWh (source: ${query.emissionSource || 'not given'}).`
			: 'No emission factor was given, so CO₂ is shown as zero.',
		'What still runs if one unit fails assumes capacity is proportional to rated watts.',
		'These are estimates from the equipment lists and the tariff, not a bill.'
	];
	return lines;
}
