// Installed or proposed in words: the scenario page's choice, the rules page and the change trail say
// the same thing about what each means for capital, replacements and payback.
import type { ScenarioStatus } from '$lib/calc';

/** The choice as the scenario page offers it. */
export const STATUS_LABELS: Record<ScenarioStatus, string> = {
	installed: 'What is installed (already paid for)',
	proposed: 'A proposal (bought now)'
};

/** What the choice means for the comparison, in one sentence. */
export const STATUS_MEANING: Record<ScenarioStatus, string> = {
	installed:
		'Its equipment counts as already paid for: its capital is only its one-off costs, and a device is bought again only when its life ends within the years compared.',
	proposed:
		'Its equipment is bought now: purchase, installation and its one-off costs are its capital, and payback weighs that outlay against the yearly saving.'
};

/** The same, short enough for the top of the scenario page on a phone. */
export const STATUS_SHORT: Record<ScenarioStatus, string> = {
	installed: 'only its one-off costs count as capital; a device is bought again when its life ends.',
	proposed: 'its equipment and one-off costs are its capital, which payback weighs against the saving.'
};

/** One word for a badge beside the scenario's name on the site page. */
export const STATUS_BADGE: Record<ScenarioStatus, string> = {
	installed: 'Installed',
	proposed: 'Proposed'
};
