import { z } from 'zod';
import { timezoneSchema } from '$lib/calc';
import { storableText, UNSTORABLE } from '$lib/forms/storable';

/**
 * What the admin chooses before a bulk import starts, read from the page's form: the sectors to take
 * (none ticked: all), a utility name the rate's utility must contain, and the time zone every tariff of
 * the file gets (the database's rates carry none).
 */

/** The open rate database's sectors, as its rates name them. */
export const SECTORS = ['Residential', 'Commercial', 'Industrial', 'Lighting'] as const;

export type BulkFilters = { sectors: string[]; utilityContains: string; timezone: string };

export const bulkFiltersSchema = z.object({
	sectors: z.array(z.enum(SECTORS, { error: 'Pick sectors from the list' })).max(SECTORS.length),
	utilityContains: z
		.string()
		.trim()
		.max(120, 'Utility must be at most 120 characters')
		.refine(storableText, UNSTORABLE),
	timezone: timezoneSchema
});

/** The form's fields as the schema reads them (several `sectors`, one of each other). */
export function filtersFromForm(form: FormData) {
	const one = (name: string) => {
		const value = form.get(name);
		return typeof value === 'string' ? value : undefined;
	};
	return {
		sectors: form.getAll('sectors').map((v) => (typeof v === 'string' ? v : '')),
		utilityContains: one('utilityContains') ?? '',
		timezone: one('timezone') ?? ''
	};
}
