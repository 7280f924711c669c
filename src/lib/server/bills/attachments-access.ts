import { error, type RequestEvent } from '@sveltejs/kit';
import { requireSiteAccess, type Role } from '../guard';
import { findAttachment } from './attachments';
import { findBill } from './bill.service';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * A bill of the site in the address, through the site's access rule: the site is checked first, so a
 * caller without access learns nothing about its bills; a bill of any other site is a 404 like one
 * that does not exist.
 */
export async function requireBillAccess(event: RequestEvent, siteId: string, billId: string, needed: Role) {
	const access = await requireSiteAccess(event, siteId, needed);
	if (!UUID.test(billId)) error(404, 'Not found');
	const bill = await findBill(billId);
	if (!bill || bill.siteId !== access.site.id) error(404, 'Not found');
	return { ...access, bill };
}

/** An attachment of the bill in the address (and so of its site); anything else is a 404. */
export async function requireAttachmentAccess(
	event: RequestEvent,
	params: { siteId: string; billId: string; attachmentId: string },
	needed: Role
) {
	const access = await requireBillAccess(event, params.siteId, params.billId, needed);
	if (!UUID.test(params.attachmentId)) error(404, 'Not found');
	const found = await findAttachment(params.attachmentId);
	if (!found || found.attachment.billId !== access.bill.id) error(404, 'Not found');
	return { ...access, attachment: found.attachment };
}
