// The scenario page's "Add to scenario": the design as JSON in one field and the page's revision,
// checked with the core's schema and saved through the same service as the API. Refusals are keyed by
// field: `design.<path>` for the design's own fields, `form` for the page as a whole.
import { fail } from '@sveltejs/kit';
import { airDesignSchema, parseRequest } from '$lib/calc';
import { revisionOf } from '$lib/forms/storable';
import { type AirDesignAccess, saveAirDesign } from './air-design.service';

/** The longest design text read: twenty air-lifts, aeration and a pump of twenty points fit many times over. */
const MAX_DESIGN_CHARS = 100_000;

const STALE =
	'Someone else saved this scenario while you were designing. Your design is still here and not saved: reload the page to see their change, then add it again.';

/** Reads, checks and saves the design; answers the new revision and the list, or a refusal by field. */
export async function airDesignFormAction(access: AirDesignAccess, form: FormData) {
	const text = form.get('design');
	// A revision that is not one matches no row and is answered as a stale page (409).
	const revision = revisionOf(form.get('revision'));
	if (typeof text !== 'string' || text.length > MAX_DESIGN_CHARS)
		return fail(400, { errors: { design: 'The design could not be read. Reload the page and try again.' } });
	let json: unknown;
	try {
		json = JSON.parse(text);
	} catch {
		return fail(400, { errors: { design: 'The design could not be read. Reload the page and try again.' } });
	}
	const parsed = parseRequest(airDesignSchema, json);
	if (!parsed.success)
		return fail(400, {
			errors: Object.fromEntries(
				parsed.error.issues.map((i) => [`design.${i.path}`.replace(/\.$/, ''), i.message])
			)
		});
	const saved = await saveAirDesign(access, revision, parsed.data);
	if ('conflict' in saved) return fail(409, { errors: { form: STALE } });
	if (!saved.ok)
		return fail(400, {
			errors: Object.fromEntries(saved.issues.map((i) => [`design.${i.path}`.replace(/\.$/, ''), i.message]))
		});
	return { airDesignSaved: true, revision: saved.revision, devices: saved.devices };
}
