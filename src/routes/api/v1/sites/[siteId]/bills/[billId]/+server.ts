import { json } from '@sveltejs/kit';
import { readJsonBody } from '$lib/server/http/body';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { billJson, overlapAnswer, parseBillBody } from '$lib/server/bills/bill-api';
import { changeBill, findBill, removeBill } from '$lib/server/bills/bill.service';
import { PRIVATE, conflict, invalid, methodNotAllowed } from '$lib/server/http/answers';
import type { RequestEvent, RequestHandler } from './$types';

/** The bill of this address, with the caller's access to its site. */
const billAccess = (event: RequestEvent, role: 'viewer' | 'editor') =>
	requireBillAccess(event, event.params.siteId, event.params.billId, role);

export const GET: RequestHandler = async (event) => {
	const { bill } = await billAccess(event, 'viewer');
	return json(billJson(bill), { headers: PRIVATE });
};

/** PUT — the whole bill with `expectedRevision`; 409 when stale or (without confirmOverlap) overlapping. */
export const PUT: RequestHandler = async (event) => {
	const { site, bill, user } = await billAccess(event, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseBillBody(read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const { confirmOverlap, expectedRevision, ...input } = parsed.data;
	if (expectedRevision === undefined) {
		return invalid([
			{ path: 'expectedRevision', message: 'Send the revision you edited (expectedRevision)' }
		]);
	}
	const saved = await changeBill(site, bill, expectedRevision, input, !!confirmOverlap, user);
	if (!saved.ok) return 'overlaps' in saved ? overlapAnswer(saved.overlaps) : conflict(saved.conflict);
	return json(billJson((await findBill(bill.id))!), { headers: PRIVATE });
};

/** DELETE — the bill and its files. */
export const DELETE: RequestHandler = async (event) => {
	const { site, bill, user } = await billAccess(event, 'editor');
	await removeBill(site, bill, user);
	return new Response(null, { status: 204 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT', 'DELETE');
