import { json } from '@sveltejs/kit';
import { apiError } from '$lib/server/http/json';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { receiveUpload } from '$lib/server/bills/attachments-upload';
import { methodNotAllowed, PRIVATE } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/**
 * POST /api/v1/sites/:siteId/bills/:billId/attachment — multipart, the bill's PDF, PNG or JPEG in the
 * field `file`. 201 with what was stored (the type as read from the bytes); 400 with the reason; 413
 * past 10 MB. The file is read back through the bill page's address in `Location`.
 */
export const POST: RequestHandler = async (event) => {
	const { siteId, billId } = event.params;
	const access = await requireBillAccess(event, siteId, billId, 'editor');
	const outcome = await receiveUpload(event, access);
	if (!outcome.ok)
		return apiError(
			outcome.status,
			outcome.status === 413 ? 'payload_too_large' : 'invalid_request',
			outcome.message,
			[{ path: 'file', message: outcome.message }]
		);
	const { id, contentType, bytes, fileName } = outcome.attachment;
	return json(
		{ id, contentType, bytes, fileName },
		{
			status: 201,
			headers: { ...PRIVATE, Location: `/sites/${siteId}/bills/${billId}/attachments/${id}` }
		}
	);
};

export const fallback: RequestHandler = () => methodNotAllowed('POST');
