import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { readJsonBody } from '$lib/server/http/body';
import { requireRole } from '$lib/server/guard';
import { createSite, listSites } from '$lib/server/sites/site.service';
import { siteCreateSchema } from '$lib/server/sites/site-body';
import { invalid } from '$lib/server/http/answers';
import { tariffChoiceIssue } from '$lib/server/sites/tariff-choice';
import type { RequestHandler } from './$types';

const issuesOf = (error: z.ZodError) =>
	error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));

/** GET /api/v1/sites?workspaceId=… — the workspace's sites. */
export const GET: RequestHandler = async (event) => {
	const id = event.url.searchParams.get('workspaceId') ?? '';
	const { workspace } = await requireRole(event, id, 'viewer');
	const sites = await listSites(workspace.id);
	return json(
		{ sites: sites.map(({ revision, ...s }) => ({ ...s, revision })) },
		{ headers: { 'Cache-Control': 'private, no-store' } }
	);
};

/**
 * POST /api/v1/sites `{ workspaceId, …site, water? }` — creates the site with an empty baseline scenario;
 * without `water`, the site starts at sea level with no tanks.
 */
export const POST: RequestHandler = async (event) => {
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const body = read.body as Record<string, unknown>;
	const { workspace, user } = await requireRole(event, String(body?.workspaceId ?? ''), 'editor');
	const parsed = siteCreateSchema.safeParse(body);
	if (!parsed.success) return invalid(issuesOf(parsed.error));
	// The creator is a member (editor or owner) of the workspace the site goes into.
	const tariffIssue = await tariffChoiceIssue({ workspaceId: workspace.id }, parsed.data);
	if (tariffIssue) return invalid([tariffIssue]);
	const id = await createSite(workspace.id, parsed.data, user);
	return json({ id }, { status: 201, headers: { Location: `/api/v1/sites/${id}` } });
};
