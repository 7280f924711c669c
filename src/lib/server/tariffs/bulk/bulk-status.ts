import { client } from '../../db';
import type { Author } from './bulk-save';
import type { BulkFilters } from './bulk-options';
import type { BulkReport } from './bulk-report';

/**
 * Where a bulk import's progress lives: in its own pg-boss job row. No table of its own (no migration):
 * the job's `output` holds the running report, written as the job goes and returned at its end, and
 * pg-boss keeps the row (then its archive) about two hours after it finishes (jobs.ts).
 */

export const BULK_JOB = 'urdb-bulk-import';

export type BulkJobData = {
	uploadId: string;
	parts: number;
	bytes: number;
	fileName: string;
	filters: BulkFilters;
	author: Author;
};

export type BulkState = 'queued' | 'running' | 'finished' | 'failed';
export type BulkStatus = {
	state: BulkState;
	fileName: string;
	filters: BulkFilters;
	report: BulkReport | null;
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Stores the running report on the job while it is active (a finished job's output is pg-boss's). */
export async function writeProgress(jobId: string, report: BulkReport): Promise<void> {
	// Sent as text and cast, so the driver does not encode the JSON a second time.
	await client`update pgboss.job set output = ${JSON.stringify(report)}::text::jsonb
		where name = ${BULK_JOB} and id = ${jobId} and state = 'active'`;
}

const STATE: Record<string, BulkState> = {
	created: 'queued',
	retry: 'queued',
	active: 'running',
	completed: 'finished'
};

/** A bulk import's state and report, or null when no such job is kept (never one of another kind). */
export async function bulkStatus(jobId: string): Promise<BulkStatus | null> {
	if (!UUID.test(jobId)) return null;
	const rows = await client<{ state: string; data: BulkJobData; output: unknown }[]>`
		select state, data, output from pgboss.job where name = ${BULK_JOB} and id = ${jobId}
		union all
		select state, data, output from pgboss.archive where name = ${BULK_JOB} and id = ${jobId}
		limit 1`;
	const row = rows[0];
	if (!row) return null;
	const output = row.output as Partial<BulkReport> | null;
	return {
		state: STATE[row.state] ?? 'failed',
		fileName: row.data.fileName,
		filters: row.data.filters,
		report: output && typeof output.phase === 'string' ? (output as BulkReport) : null
	};
}
