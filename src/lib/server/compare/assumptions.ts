import type { ScenarioStatus } from '$lib/calc';
import type { ComparedScenario, ComparisonQuery } from '$lib/compare/types';

const STATUS_CLAUSE: Record<ScenarioStatus, string> = {
	installed: 'what is installed (already paid for)',
	proposed: 'a proposal (bought now)'
};

/**
 * The choices and rules behind a comparison, in sentences a grant reviewer can check. `statuses`, in the
 * order of `scenarios`, says of each whether it is what is installed or a proposal.
 */
export function assumptionsOf(
	query: ComparisonQuery,
	scenarios: ComparedScenario[],
	zones: string[],
	zone: string,
	statuses: readonly ScenarioStatus[] = []
): string[] {
	const status = (i: number) => {
		const known = statuses[i];
		return known ? ` It is ${STATUS_CLAUSE[known]}.` : '';
	};
	const lines = [
		`The year compared is the 12 calendar months from ${query.start}, each billed as one period.`,
		...scenarios.map(
			(s, i) =>
				`“${s.name}” is priced on ${s.tariffName}, version ${s.tariffVersion} (the version in force on the first day).${status(i)}`
		),
		`Clock times, weekends and public holidays follow the time zone ${zone} of the baseline’s site${
			new Set(zones).size > 1 ? '; scenarios of sites in other time zones are counted in it too' : ''
		}.`,
		`Energy costs rise ${query.escalationPercent} % a year; future costs are discounted at ${query.discountPercent} % a year over ${query.horizonYears} years; year 0 is the capital cost.`,
		'A proposal is bought now: its capital cost is the purchase and installation of its equipment plus its one-off costs. What is installed is already paid for: its capital cost is only its one-off costs. One-off costs (a trench, a circuit, an electrician’s visit) are part of year 0 either way.',
		'Each device, installed or proposed, is bought again at the end of its stated life within the horizon (installation is not repeated); maintenance is paid every year.',
		'Simple payback is the extra capital cost over the baseline divided by the yearly saving; against what is installed, that is the proposal’s whole outlay.',
		query.emissionKgPerKwh > 0
			? `CO₂ is the year’s kWh × ${query.emissionKgPerKwh} kg per kWh (source: ${query.emissionSource || 'not given'}).`
			: 'No emission factor was given, so CO₂ is “not set”: give one (kg CO₂ per kWh) and its source to see it.',
		'What still runs if one unit fails assumes capacity is proportional to rated watts.',
		'These are estimates from the equipment lists and the tariff, not a bill.'
	];
	return lines;
}
