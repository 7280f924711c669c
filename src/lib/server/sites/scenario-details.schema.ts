// What a scenario's details save takes, checked the same way from the API and the scenario page's form.
// No database here, so the form reader and its tests load it alone.
import { z } from 'zod';
import { list, oneOffCostSchema, SCENARIO_STATUSES, type OneOffCost } from '$lib/calc';
import { scenarioSchema } from '$lib/forms/site.schema';

/** At most this many one-off costs a scenario. */
export const MAX_ONE_OFF_COSTS = 50;

/** The status and one-off costs as a request or a form sends them; each may be left out. */
export const statusSchema = z.enum(SCENARIO_STATUSES, {
	error: 'Choose whether this is what is installed or a proposal'
});
export const oneOffCostsSchema = list('One-off costs', oneOffCostSchema, {
	max: MAX_ONE_OFF_COSTS,
	tooMany: `A scenario holds at most ${MAX_ONE_OFF_COSTS} one-off costs`
});
export const nameSchema = scenarioSchema.shape.name;
/** The description; null and an empty text both mean none. */
export const descriptionSchema = z.preprocess((v) => (v === null ? '' : v), scenarioSchema.shape.description);

/** What a save may change; a field left out keeps its value. `tariff` null: the site's tariff. */
export type ScenarioDetails = {
	name?: string;
	description?: string | null;
	status?: (typeof SCENARIO_STATUSES)[number];
	oneOffCosts?: OneOffCost[];
	tariff?: { tariffId: string; tariffVersion: number | null } | null;
};
