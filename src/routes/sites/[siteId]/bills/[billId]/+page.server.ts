import { fail, redirect } from '@sveltejs/kit';
import { readBillForm } from '$lib/server/bills/bill-form';
import { deleteBill, overlappingBills, updateBill } from '$lib/server/bills/bill.service';
import { reconcileBill } from '$lib/server/bills/bill-reconciliation';
import { requireBillAccess } from '$lib/server/bills/attachments-access';
import { attachmentKeys, discardObjects, listAttachments } from '$lib/server/bills/attachments';
import { StaleWrite } from '$lib/server/sites/site.service';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site, bill, role } = await requireBillAccess(
		event,
		event.params.siteId,
		event.params.billId,
		'viewer'
	);
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
		const { site, bill, user } = await requireBillAccess(
			event,
			event.params.siteId,
			event.params.billId,
			'editor'
		);
		const read = readBillForm(await event.request.formData());
		if (!read.ok) return fail(400, { values: read.values, errors: read.errors });
		const overlaps = await overlappingBills(site.id, read.bill.periodFrom, read.bill.periodTo, bill.id);
		if (overlaps.length && !read.confirmOverlap) {
			return fail(409, {
				values: read.values,
				errors: {},
				overlaps: overlaps.map((o) => `${o.periodFrom} to ${o.periodTo}`)
			});
		}
		try {
			await updateBill(site, bill, read.revision, read.bill, user);
		} catch (e) {
			if (!(e instanceof StaleWrite)) throw e;
			return fail(409, {
				values: read.values,
				errors: {
					form: 'Someone saved this bill while you were editing. Your changes are kept below; reload to see theirs.'
				}
			});
		}
		return { saved: true };
	},
	delete: async (event) => {
		const { site, bill, user } = await requireBillAccess(
			event,
			event.params.siteId,
			event.params.billId,
			'editor'
		);
		const keys = await attachmentKeys(bill.id);
		await deleteBill(site, bill, user);
		await discardObjects(keys);
		redirect(303, `/sites/${site.id}/bills`);
	}
} satisfies Actions;
