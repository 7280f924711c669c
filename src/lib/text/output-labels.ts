/**
 * The one glossary of what a comparison's outputs call each quantity: the compare page, the printable
 * report, the cost justification, the workbook and the CSV all take their labels from here, so a
 * grant reviewer reading two of them finds the same name for the same figure. Browser-safe.
 */
export const OUTPUT_LABELS = {
	scenario: 'Scenario',
	site: 'Site',
	tariff: 'Tariff',
	baseline: 'Baseline',
	status: 'Status',
	description: 'Description',
	energy: 'Energy a year',
	runningCost: 'Running cost a year',
	/** Year 0: what a proposal buys now plus its one-off costs; for what is installed, its one-off costs only. */
	capital: 'Purchase and installation',
	oneOffCosts: 'One-off costs',
	maintenance: 'Maintenance a year',
	saving: 'Saving a year against the baseline',
	payback: 'Simple payback',
	lifecycle: 'Lifecycle cost',
	co2: 'CO₂ a year',
	/** The bill of a year of the horizon, grown by the energy price rise. */
	escalatedBill: 'Electricity bill with the price rise',
	replacements: 'Replacements',
	cashFlow: 'Cash flow',
	escalation: 'Energy price rise',
	discount: 'Discount rate',
	horizon: 'Horizon',
	emissionFactor: 'Emission factor',
	emissionSource: 'Source of the emission factor',
	equipment: 'Equipment',
	category: 'Category',
	quantity: 'Quantity',
	power: 'Power per unit',
	schedule: 'Schedule',
	kwhPerYear: 'kWh a year',
	costPerYear: 'Cost a year',
	made: 'Made'
} as const;

export type OutputLabel = keyof typeof OUTPUT_LABELS;

/** The status of a scenario in words, for tables and sentences. */
export const STATUS_LABELS = {
	installed: 'Installed (already paid for)',
	proposed: 'Proposed (bought now)'
} as const;

/** What "at once" and "never" mean, said the same way on the page, in the workbook and in the CSV. */
export const PAYBACK_WORDS = {
	atOnce: 'at once: it costs no more to buy than the baseline',
	never: 'never: it saves nothing a year'
} as const;

/** Until someone gives an emission factor, CO₂ is not worked out; this says so and how to set one. */
export const CO2_NOT_SET = 'not set';
export const CO2_HOW_TO_SET =
	'CO₂ is not set: give an emission factor (kg CO₂ per kWh, from your utility or grid operator) and its source with the comparison’s choices.';

/** A label with its unit in brackets: "Running cost a year (USD)". */
export const withUnit = (label: OutputLabel, unit: string) => `${OUTPUT_LABELS[label]} (${unit})`;

/**
 * The CSV column name of a label: the same words in lower case joined by underscores, with the unit
 * last — "Purchase and installation" in USD is `purchase_and_installation_USD`.
 */
export function csvColumn(label: OutputLabel, unit?: string): string {
	const words = OUTPUT_LABELS[label]
		.toLowerCase()
		.replace('co₂', 'co2')
		.replace(/[^a-z0-9]+/g, '_')
		.replace(/^_|_$/g, '');
	return unit ? `${words}_${unit}` : words;
}
