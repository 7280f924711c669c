import { json } from '@sveltejs/kit';
import { readJsonBody } from '$lib/server/http/body';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { attachmentKeys, discardObjects } from '$lib/server/bills/attachments';
import { billJson, overlapAnswer, parseBillBody } from '$lib/server/bills/bill-api';
import { deleteBill, findBill, overlappingBills, updateBill } from '$lib/server/bills/bill.service';
import { StaleWrite } from '$lib/server/sites/site.service';
import { PRIVATE, conflict, invalid, methodNotAllowed } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	const { bill } = await requireBillAccess(event, event.params.siteId, event.params.billId, 'viewer');
	return json(billJson(bill), { headers: PRIVATE });
};

/** PUT — the whole bill with `expectedRevision`; 409 when stale or (without confirmOverlap) overlapping. */
export const PUT: RequestHandler = async (event) => {
	const { site, bill, user } = await requireBillAccess(
		event,
		event.params.siteId,
		event.params.billId,
		'editor'
	);
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
	const overlaps = await overlappingBills(site.id, input.periodFrom, input.periodTo, bill.id);
	if (overlaps.length && !confirmOverlap) return overlapAnswer(overlaps);
	try {
		await updateBill(site, bill, expectedRevision, input, user);
	} catch (e) {
		if (e instanceof StaleWrite) return conflict(e.currentRevision);
		throw e;
	}
	return json(billJson((await findBill(bill.id))!), { headers: PRIVATE });
};

/** DELETE — the bill and its files. */
export const DELETE: RequestHandler = async (event) => {
	const { site, bill, user } = await requireBillAccess(
		event,
		event.params.siteId,
		event.params.billId,
		'editor'
	);
	const keys = await attachmentKeys(bill.id);
	await deleteBill(site, bill, user);
	await discardObjects(keys);
	return new Response(null, { status: 204 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT', 'DELETE');
