import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { startJobs } from '$lib/server/jobs';
import { sequence } from '@sveltejs/kit/hooks';
import { eq } from 'drizzle-orm';
import { apiJsonErrors } from '$lib/server/api-errors';
import { authHandle } from '$lib/server/auth';
import { rememberSession, sessionToken, verifiedUserId } from '$lib/server/auth/session-cache';
import { db } from '$lib/server/db';
import { isDatabaseUnavailable } from '$lib/server/db/errors';
import { users } from '$lib/server/db/schema';
import { logger } from '$lib/server/log';
import { unavailableResponse } from '$lib/server/unavailable';

/** Resolves the signed-in user once; every load, action and endpoint reads `locals.user`. The user row
 * is read on every request, so a deleted account or a changed admin flag takes effect at once. */
const resolveUser: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	const token = sessionToken(event.cookies);
	let id = verifiedUserId(token);
	if (!id) {
		id = (await event.locals.auth())?.user?.id;
		if (id) rememberSession(event.cookies, token, id);
	}
	if (id) {
		try {
			const [row] = await db
				.select({ id: users.id, email: users.email, name: users.name, isAdmin: users.isAdmin })
				.from(users)
				.where(eq(users.id, id));
			event.locals.user = row ?? null;
		} catch (error) {
			if (isDatabaseUnavailable(error)) return unavailableResponse(event);
			throw error;
		}
	}
	return resolve(event);
};

/** A database outage anywhere in the request becomes a readable 503 instead of a 500. */
const databaseOutage: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	return event.locals.databaseDown ? unavailableResponse(event) : response;
};

const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	response.headers.set('X-Content-Type-Options', 'nosniff');
	response.headers.set('Referrer-Policy', 'strict-origin-when-cross-origin');
	response.headers.set('X-Frame-Options', 'DENY');
	return response;
};

export const handle = sequence(securityHeaders, apiJsonErrors, databaseOutage, authHandle, resolveUser);

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
	await import('$lib/server/services/tariff-notice.service');
	await import('$lib/server/services/workspace-deletion.service');
	await startJobs();
};
