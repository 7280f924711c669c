import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { submitTariff } from './publish';

/** The editor's form posts one hidden `payload` field holding the same JSON the API takes. */
export async function tariffFormAction(
	event: RequestEvent,
	target: { tariffId: string } | { workspaceId: string | null }
) {
	const form = await event.request.formData();
	let body: unknown;
	try {
		body = JSON.parse(String(form.get('payload') ?? ''));
	} catch {
		return fail(400, { issues: [{ path: '', message: 'The form did not arrive whole. Try saving again.' }] });
	}
	const outcome = await submitTariff(event, target, body);
	if (outcome.ok) redirect(303, `/tariffs/${outcome.tariffId}?published=${outcome.number}`);
	if (outcome.status === 400) return fail(400, { issues: outcome.invalid.issues });
	return fail(409, {
		conflict: `${outcome.message} Nothing was saved. Open the tariff again to see their version, then make your change on top of it.`
	});
}
