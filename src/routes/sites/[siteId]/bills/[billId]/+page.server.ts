// A little over 60 lines: the bill page's load (with its reconciliation) and its two actions, update and delete.
import { fail, redirect } from '@sveltejs/kit';
import { readBillForm } from '$lib/server/bills/bill-form';
import { changeBill, removeBill } from '$lib/server/bills/bill.service';
import { reconcileBill } from '$lib/server/bills/bill-reconciliation';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { listAttachments } from '$lib/server/bills/attachments';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

/** The bill of this page's address, with the caller's access to its site. */
const billAccess = (event: RequestEvent, role: 'viewer' | 'editor') =>
	requireBillAccess(event, event.params.siteId, event.params.billId, role);

export const load = (async (event) => {
	const { site, bill, role } = await billAccess(event, 'viewer');
	const checked = await reconcileBill(site, bill, event.url.searchParams.get('scenario'));
	return {
		bill: {
			id: bill.id,
			periodFrom: bill.periodFrom,
			periodTo: bill.periodTo,
			kwh: bill.kwh,
			amount: bill.amount,
			peakKw: bill.peakKw,
			lineItems: bill.lineItems,
			notes: bill.notes,
			revision: bill.revision
		},
		choices: checked.choices,
		chosen: checked.chosen,
		reconciliation: checked.result.ok ? checked.result.reconciliation : null,
		problem: checked.result.ok ? null : checked.result.message,
		attachments: await listAttachments(bill.id),
		canEdit: role !== 'viewer'
	};
}) satisfies PageServerLoad;

export const actions = {
	update: async (event) => {
		const { site, bill, user } = await billAccess(event, 'editor');
		const read = readBillForm(await event.request.formData());
		if (!read.ok) return fail(400, { values: read.values, errors: read.errors });
		const saved = await changeBill(site, bill, read.revision, read.bill, read.confirmOverlap, user);
		if (!saved.ok && 'overlaps' in saved) {
			const overlaps = saved.overlaps.map((o) => `${o.periodFrom} to ${o.periodTo}`);
			return fail(409, { values: read.values, errors: {}, overlaps });
		}
		if (!saved.ok)
			return fail(409, {
				values: read.values,
				errors: {
					form: 'Someone saved this bill while you were editing. Your changes are kept below; reload to see theirs.'
				}
			});
		return { saved: true };
	},
	delete: async (event) => {
		const { site, bill, user } = await billAccess(event, 'editor');
		await removeBill(site, bill, user);
		redirect(303, `/sites/${site.id}/bills`);
	}
} satisfies Actions;
