import { fail, redirect } from '@sveltejs/kit';
import { readBillForm } from '$lib/server/bills/bill-form';
import { addBill, importBillSheet, listBills } from '$lib/server/bills/bill.service';
import { BILL_COLUMNS } from '$lib/server/bills/bill-sheet';
import { billEstimates } from '$lib/server/bills/estimates';
import { requireSiteAccess } from '$lib/server/guard';
import { MAX_SHEET_BYTES, sheetKind } from '$lib/server/sheets/read-sheet';
import { uploadForm } from '$lib/server/http/upload-form';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site, role } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const bills = await listBills(site.id);
	return {
		bills: bills.map((b) => ({
			id: b.id,
			periodFrom: b.periodFrom,
			periodTo: b.periodTo,
			kwh: b.kwh,
			amount: b.amount,
			peakKw: b.peakKw
		})),
		estimates: await billEstimates(site, bills),
		columns: BILL_COLUMNS.map((c) => ({ name: c.name, meaning: c.meaning })),
		canEdit: role !== 'viewer'
	};
}) satisfies PageServerLoad;

export const actions = {
	add: async (event) => {
		const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
		const read = readBillForm(await event.request.formData());
		if (!read.ok) return fail(400, { form: 'add', values: read.values, errors: read.errors });
		const added = await addBill(site, read.bill, read.confirmOverlap, user);
		if (!added.ok) {
			const overlaps = added.overlaps.map((o) => `${o.periodFrom} to ${o.periodTo}`);
			return fail(409, { form: 'add', values: read.values, errors: {}, overlaps });
		}
		const id = added.id;
		redirect(303, `/sites/${site.id}/bills/${id}`);
	},

	import: async (event) => {
		const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
		const form = await uploadForm(event.request);
		const refuse = (message: string, status = 400) =>
			fail(status, { form: 'import', sheetError: message, refused: [] });
		const tooLarge = `The file is over ${MAX_SHEET_BYTES / 1024 / 1024} MB.`;
		if (form === 'too-large') return refuse(tooLarge, 413);
		const file = form.get('sheet');
		if (!(file instanceof File) || file.size === 0) return refuse('Choose a CSV or XLSX file.');
		if (file.size > MAX_SHEET_BYTES) return refuse(tooLarge, 413);
		const kind = sheetKind(file.name);
		if (!kind) return refuse('The file must end in .csv or .xlsx.');
		const done = await importBillSheet(site, new Uint8Array(await file.arrayBuffer()), kind, user);
		if (!done.ok) return fail(400, { form: 'import', sheetError: done.sheetError, refused: done.refused });
		return { form: 'import', imported: done.imported };
	}
} satisfies Actions;
