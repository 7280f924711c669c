import { defineJob } from '../../jobs';
import { logger } from '../../log';
import { BULK_JOB, writeProgress, type BulkJobData } from './bulk-status';
import { countImported, countPresent, countSkipped, emptyReport, type BulkReport } from './bulk-report';
import { savePublicRate } from './bulk-save';
import { dropUpload, uploadBytes } from './bulk-upload';
import { rateOutcome } from './rate-outcome';
import { MAX_RATE_CHARS, RateFileError, readRates } from './rate-stream';

/**
 * The bulk import of open rate database rates as public tariffs, run on the job queue: it streams the
 * uploaded file, and for each rate applies the admin's filters, validates, converts and saves it in its
 * own transaction, so one broken rate never stops or half-saves the rest. The running report is
 * written to the job about once a second; the job's answer is the final report.
 */

/** How often the running report is written, at most. */
const PROGRESS_MS = 1000;

const TOO_LARGE = `The rate holds more than ${MAX_RATE_CHARS.toLocaleString('en-US')} characters of JSON; real rates are a few thousand`;

export async function runBulkImport(
	jobId: string,
	data: BulkJobData,
	today = new Date().toISOString().slice(0, 10)
): Promise<BulkReport> {
	const report = emptyReport(data.bytes);
	const progress = { bytes: 0 };
	let written = 0;
	const flush = async (force = false) => {
		report.bytesRead = progress.bytes;
		if (!force && Date.now() - written < PROGRESS_MS) return;
		written = Date.now();
		await writeProgress(jobId, report);
	};
	try {
		for await (const item of readRates(uploadBytes(data.uploadId, data.parts), progress)) {
			report.read += 1;
			if ('tooLarge' in item) countSkipped(report, { label: null, name: null }, item.index, [TOO_LARGE]);
			else {
				const outcome = rateOutcome(item.rate, data.filters, today);
				if (outcome.kind === 'filtered') {
					if (outcome.by === 'sector') report.filteredBySector += 1;
					else report.filteredByUtility += 1;
				} else if (outcome.kind === 'skipped') countSkipped(report, outcome, item.index, outcome.reasons);
				else {
					const saved = await savePublicRate(outcome.label, outcome.submission, data.author);
					const rate = { id: saved.id, label: outcome.label, name: outcome.name };
					if (saved.kind === 'present') countPresent(report, rate);
					else countImported(report, rate, outcome.notes);
				}
			}
			await flush();
		}
		report.phase = 'done';
	} catch (error) {
		report.phase = 'stopped';
		if (error instanceof RateFileError) report.message = error.message;
		else {
			logger.error({ err: error, jobId }, 'the bulk rate import stopped on an unexpected error');
			report.message = `The import stopped on an unexpected error after ${report.read.toLocaleString('en-US')} rates; the rates before it were handled as this report shows. Try the file again later: rates already imported will show as already present.`;
		}
	} finally {
		await dropUpload(data.uploadId, data.parts).catch((error) =>
			logger.warn({ err: error, jobId }, 'the bulk upload’s parts could not be removed')
		);
	}
	await flush(true);
	return report;
}

/** Not retried (a second run would only find its own rates present); a big file may take hours. */
export const bulkImportJob = defineJob<BulkJobData>(
	BULK_JOB,
	async (data, jobId) => runBulkImport(jobId, data),
	{ retryLimit: 0, expireInSeconds: 6 * 3600 }
);
