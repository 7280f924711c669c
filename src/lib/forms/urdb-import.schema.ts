import { z } from 'zod';
import type { ImportNote, TariffInput } from '$lib/calc';

// The single-rate import's choices: the open rate database's rates say nothing of their time zone, so the
// person picks one of the US zones the utility's hours are in.

/** US time zones, by the name people use, each with its IANA name (the ones a US utility's hours use). */
export const US_TIME_ZONES = [
	['America/New_York', 'Eastern (New York)'],
	['America/Detroit', 'Eastern (Michigan)'],
	['America/Indiana/Indianapolis', 'Eastern (Indiana)'],
	['America/Chicago', 'Central (Chicago)'],
	['America/Denver', 'Mountain (Denver)'],
	['America/Boise', 'Mountain (Idaho)'],
	['America/Phoenix', 'Mountain, no daylight saving (Arizona)'],
	['America/Los_Angeles', 'Pacific (Los Angeles)'],
	['America/Anchorage', 'Alaska (Anchorage)'],
	['America/Adak', 'Hawaii–Aleutian (Adak)'],
	['Pacific/Honolulu', 'Hawaii (Honolulu)'],
	['America/Puerto_Rico', 'Atlantic (Puerto Rico)'],
	['Pacific/Guam', 'Chamorro (Guam)']
] as const;

const ZONES = US_TIME_ZONES.map(([zone]) => zone) as [string, ...string[]];

/**
 * The save form's own choices (where it goes is checked against the person's workspaces apart); the rate
 * itself is read again from its JSON, never from the preview.
 */
export const urdbSaveSchema = z.object({
	timezone: z.enum(ZONES, { error: 'Choose the time zone the utility’s hours are in.' }),
	effectiveFrom: z
		.string()
		.optional()
		.transform((s) => (s ? s.trim() : null)),
	/** Leave out the end date the database gives: the person prices the rate as still in force. */
	openEnded: z
		.string()
		.optional()
		.transform((s) => s === 'on')
});

/** What the import page shows of a rate it read: the charges, the notes and where the rate came from. */
export type UrdbPreview = {
	kind: 'converted' | 'refused';
	tariff: TariffInput | null;
	notes: ImportNote[];
	provenance: {
		utility: string | null;
		name: string | null;
		sector: string | null;
		customerClass: string;
		startDate: string | null;
		endDate: string | null;
		label: string | null;
		uri: string | null;
		source: string | null;
	};
};
