import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { startJobs } from '$lib/server/jobs';
import { sequence } from '@sveltejs/kit/hooks';
import { apiJsonErrors } from '$lib/server/http/api-errors';
import { authHandle } from '$lib/server/auth';
import { onlyPublicAuthDoors } from '$lib/server/auth/public-doors';
import {
	carriesSessionCookie,
	dropSessionCookie,
	rememberSession,
	sessionToken,
	verifiedSession
} from '$lib/server/auth/session-cache';
import { sitesHomeOf } from '$lib/server/accounts/landing';
import { liveSessionUser } from '$lib/server/auth/sessions';
import { finishReadingBody } from '$lib/server/http/unread-body';
import { isDatabaseUnavailable } from '$lib/server/db/errors';
import { logger } from '$lib/server/log';
import { withSecurityHeaders } from '$lib/server/security-headers';
import { unavailableResponse } from '$lib/server/http/unavailable';

/** Resolves the signed-in user once; every load, action and endpoint reads `locals.user`. The user row
 * and the session's own row (`auth/sessions.ts`) are read together on every request that carries a
 * session cookie, so a deleted account, a changed admin flag or an ended session (sign-out, "sign out
 * everywhere", a password reset) takes effect at once. A request without one is anonymous at no cost. */
const resolveUser: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.sessionId = null;
	event.locals.sitesHome = null;
	const token = sessionToken(event.cookies);
	let session = verifiedSession(token);
	if (!session && carriesSessionCookie(event.cookies)) {
		const auth = await event.locals.auth();
		// A token from before sessions were recorded has no sid: it is treated as ended.
		if (auth?.user?.id && auth.sid) {
			session = { userId: auth.user.id, sid: auth.sid };
			rememberSession(event.cookies, token, session);
		} else if (auth?.user) dropSessionCookie(event.cookies);
	}
	if (session) {
		try {
			const live = await liveSessionUser(session.userId, session.sid);
			event.locals.user = live?.user ?? null;
			event.locals.sitesHome = live ? sitesHomeOf(live.someWorkspaces) : null;
		} catch (error) {
			if (isDatabaseUnavailable(error)) return unavailableResponse(event);
			throw error;
		}
		if (event.locals.user) event.locals.sessionId = session.sid;
		else dropSessionCookie(event.cookies);
	}
	return resolve(event);
};

/** A database outage anywhere in the request becomes a readable 503 instead of a 500. */
const databaseOutage: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	return event.locals.databaseDown ? unavailableResponse(event) : response;
};

/** On every response, Auth.js's immutable redirects included. */
const securityHeaders: Handle = async ({ event, resolve }) => withSecurityHeaders(await resolve(event));

// finishReadingBody first: it sees the finished response last, and holds it until the body is read.
export const handle = sequence(
	finishReadingBody,
	securityHeaders,
	apiJsonErrors,
	databaseOutage,
	onlyPublicAuthDoors(authHandle),
	resolveUser
);

export const handleError: HandleServerError = ({ error, event, status, message }) => {
	if (isDatabaseUnavailable(error)) {
		event.locals.databaseDown = true;
		return { message: 'The database is not answering. Try again in a moment.', code: 'database_unavailable' };
	}
	if (status !== 404) logger.error({ err: error, path: event.url.pathname }, 'unexpected error');
	return { message: status === 404 ? 'Not found' : message };
};

/** Starts the job queue's workers with the server; the job modules register their jobs when imported. */
export const init: ServerInit = async () => {
	await import('$lib/server/tariffs/tariff-notice.service');
	await import('$lib/server/workspaces/deletion');
	await import('$lib/server/tariffs/bulk/bulk-job');
	await import('$lib/server/sites/reprice-job');
	await startJobs();
};
