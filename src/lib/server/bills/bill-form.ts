import { billSchema } from '$lib/forms/bill.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { revisionOf } from '$lib/forms/storable';

/** The bill form's fields: line items come as "label | amount" lines in one text box. */
export function readBillForm(form: FormData) {
	const values = keepValues(form);
	const lineErrors: string[] = [];
	const lineItems = String(form.get('lineItems') ?? '')
		.split('\n')
		.map((line) => line.trim())
		.filter(Boolean)
		.map((line, i) => {
			const match = /^(.*?)[|;\t]\s*(-?[\d.,]+)\s*$/.exec(line);
			if (!match)
				lineErrors.push(`Line ${i + 1}: write it as “label | amount”, such as “Customer charge | 14.50”`);
			return { label: match?.[1]?.trim() ?? line, amount: match?.[2]?.replace(/,/g, '') ?? '' };
		});
	const parsed = billSchema.safeParse({
		periodFrom: form.get('periodFrom'),
		periodTo: form.get('periodTo'),
		kwh: form.get('kwh'),
		amount: form.get('amount'),
		peakKw: form.get('peakKw'),
		lineItems,
		notes: form.get('notes')
	});
	if (!parsed.success || lineErrors.length) {
		const errors = parsed.success ? {} : fieldErrors(parsed.error);
		const itemIssue = parsed.success ? undefined : parsed.error.issues.find((i) => i.path[0] === 'lineItems');
		if (lineErrors.length || itemIssue) errors.lineItems = lineErrors[0] ?? itemIssue?.message ?? '';
		return { ok: false as const, values, errors };
	}
	return {
		ok: true as const,
		values,
		bill: parsed.data,
		revision: revisionOf(form.get('expectedRevision')),
		confirmOverlap: form.get('confirmOverlap') === 'yes'
	};
}
