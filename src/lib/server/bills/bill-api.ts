import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { parseRequest } from '$lib/calc';
import { billSchema } from '$lib/forms/bill.schema';
import type { BillRow } from './bill.service';
import { MAX_REVISION } from '$lib/forms/storable';

/** The JSON body of POST and PUT: a bill, plus the overlap confirmation and (PUT) the revision edited. */
export const billBodySchema = z.intersection(
	billSchema,
	z.object({
		confirmOverlap: z.boolean({ error: 'confirmOverlap must be true or false' }).default(false),
		expectedRevision: z.number().int().min(0).max(MAX_REVISION).optional()
	})
);

export const parseBillBody = (body: unknown) => parseRequest(billBodySchema, body);

export const billJson = (b: BillRow) => ({
	id: b.id,
	siteId: b.siteId,
	periodFrom: b.periodFrom,
	periodTo: b.periodTo,
	kwh: b.kwh,
	amount: b.amount,
	peakKw: b.peakKw,
	lineItems: b.lineItems,
	notes: b.notes,
	revision: b.revision
});

/** 409 for a period that overlaps other bills, naming them; sending confirmOverlap: true saves it anyway. */
export const overlapAnswer = (overlaps: { id: string; periodFrom: string; periodTo: string }[]) =>
	json(
		{
			error: 'overlap',
			message: 'This period overlaps another bill of the site; send confirmOverlap: true to save it anyway.',
			overlaps
		},
		{ status: 409 }
	);
