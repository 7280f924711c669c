import { json } from '@sveltejs/kit';
import { apiError } from '$lib/server/http/json';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { reconcileBill } from '$lib/server/bills/bill-reconciliation';
import { PRIVATE } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/** GET …/reconciliation?scenario=id — the bill against the chosen scenario (the baseline by default). */
export const GET: RequestHandler = async (event) => {
	const { site, bill } = await requireBillAccess(event, event.params.siteId, event.params.billId, 'viewer');
	const checked = await reconcileBill(site, bill, event.url.searchParams.get('scenario'));
	if (!checked.result.ok) return apiError(422, 'cannot_reconcile', checked.result.message);
	return json(checked.result.reconciliation, { headers: PRIVATE });
};
