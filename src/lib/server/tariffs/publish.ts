import type { RequestEvent } from '@sveltejs/kit';
import { parseRequest, type InvalidRequest } from '$lib/calc';
import { requireAdmin, requireRole, requireTariffWrite } from '../guard';
import { createTariff, publishVersion, TariffConflict } from '$lib/server/tariffs/tariff.service';
import { tariffSubmissionSchema } from './submission';
import { announceVersion } from '$lib/server/tariffs/tariff-notice.service';
import { repriceAfterPublish } from '$lib/server/sites/reprice-job';

export type PublishOutcome =
	| { ok: true; tariffId: string; number: number }
	| { ok: false; status: 400; invalid: InvalidRequest }
	| { ok: false; status: 409; message: string; currentRevision: number };

/**
 * Creates a tariff (workspaceId null = public, admins only; else that workspace's editors), or publishes a
 * new version of an existing one. Shared by the editor's form action and the JSON API, so both give the
 * same field paths and the same conflict rule.
 */
export async function submitTariff(
	event: RequestEvent,
	target: { tariffId: string } | { workspaceId: string | null },
	body: unknown
): Promise<PublishOutcome> {
	const writable = 'tariffId' in target ? await requireTariffWrite(event, target.tariffId) : null;
	const isPublic = !!writable && !writable.tariff.workspaceId;
	let author: SessionUser;
	if (writable) author = writable.user;
	else if ('workspaceId' in target && target.workspaceId)
		author = (await requireRole(event, target.workspaceId, 'editor')).user;
	else author = requireAdmin(event);
	const parsed = parseRequest(tariffSubmissionSchema, body);
	if (!parsed.success) return { ok: false, status: 400, invalid: parsed.error };
	const { meta, version, structure, expectedRevision } = parsed.data;
	if ('workspaceId' in target) {
		const tariffId = await createTariff(
			{ meta, version, structure, workspaceId: target.workspaceId },
			author
		);
		return { ok: true, tariffId, number: 1 };
	}
	if (expectedRevision === undefined)
		return {
			ok: false,
			status: 400,
			invalid: {
				error: 'invalid_request',
				issues: [{ path: 'expectedRevision', message: 'Send the revision you edited (expectedRevision)' }]
			}
		};
	try {
		const { number } = await publishVersion(
			target.tariffId,
			expectedRevision,
			{ meta, version, structure },
			author
		);
		// A new public version tells every workspace with a site on it, through the job queue.
		if (isPublic) await announceVersion({ tariffId: target.tariffId, versionNumber: number });
		// The stored years of the baselines on it are priced again ahead of their next view.
		await repriceAfterPublish(target.tariffId);
		return { ok: true, tariffId: target.tariffId, number };
	} catch (e) {
		if (e instanceof TariffConflict)
			return { ok: false, status: 409, message: e.message, currentRevision: e.currentRevision };
		throw e;
	}
}
