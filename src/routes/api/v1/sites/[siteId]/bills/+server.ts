import { json } from '@sveltejs/kit';
import { readJsonBody } from '$lib/server/http/body';
import { billJson, overlapAnswer, parseBillBody } from '$lib/server/bills/bill-api';
import { addBill, findBill, listBills } from '$lib/server/bills/bill.service';
import { requireSiteAccess } from '$lib/server/guard';
import { PRIVATE, invalid, methodNotAllowed } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/** GET — the site's bills, oldest first. */
export const GET: RequestHandler = async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return json({ bills: (await listBills(site.id)).map(billJson) }, { headers: PRIVATE });
};

/** POST — a new bill; 409 when its period overlaps another unless confirmOverlap is true. */
export const POST: RequestHandler = async (event) => {
	const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseBillBody(read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const { confirmOverlap, expectedRevision: _, ...bill } = parsed.data;
	const added = await addBill(site, bill, !!confirmOverlap, user);
	if (!added.ok) return overlapAnswer(added.overlaps);
	const id = added.id;
	const created = await findBill(id);
	return json(billJson(created!), {
		status: 201,
		headers: { Location: `/api/v1/sites/${site.id}/bills/${id}` }
	});
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'POST');
