import { json, redirect } from '@sveltejs/kit';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { receiveUpload } from '$lib/server/bills/attachments-upload';
import type { RequestHandler } from './$types';

/**
 * The bill page's upload form. A plain form post comes back to the bill page (303), with the reason of
 * a refusal in the address for the form to word; the page's script asks for JSON and gets 201, or 400 /
 * 413 with the message.
 */
export const POST: RequestHandler = async (event) => {
	const { siteId, billId } = event.params;
	const access = await requireBillAccess(event, siteId, billId, 'editor');
	const outcome = await receiveUpload(event, access);
	if (event.request.headers.get('accept')?.includes('application/json')) {
		const headers = { 'Cache-Control': 'private, no-store' };
		return outcome.ok
			? json(outcome.attachment, { status: 201, headers })
			: json({ error: outcome.reason, message: outcome.message }, { status: outcome.status, headers });
	}
	const billPage = `/sites/${siteId}/bills/${billId}`;
	redirect(
		303,
		outcome.ok ? `${billPage}#attachments` : `${billPage}?attachment-error=${outcome.reason}#attachments`
	);
};
