import type { Handle } from '@sveltejs/kit';

/** Where Auth.js answers HTTP requests (its default base path). */
const AUTH_BASE = '/auth/';

/**
 * The only Auth.js addresses a browser needs: the e-mailed sign-in link (`GET /auth/callback/email?token=…`)
 * and the page Auth.js sends people to once that e-mail is queued (`GET /auth/verify-request`, which only
 * redirects to our /signin/check-email). Neither checks a password nor sends anything.
 */
const PUBLIC_GETS = new Set([`${AUTH_BASE}callback/email`, `${AUTH_BASE}verify-request`]);

export function isPublicAuthDoor(method: string, pathname: string): boolean {
	return method === 'GET' && PUBLIC_GETS.has(pathname);
}

/**
 * Puts Auth.js's handle behind its public doors. Everything else Auth.js does — checking a password,
 * sending a sign-in e-mail, signing out — is started by Runrate's own form actions, which validate,
 * rate-limit and lock first and then call Auth.js inside the process (`hand-over.ts`, `signOut`), never
 * through these paths. Left open, `POST /auth/callback/password` took password guesses that no lock
 * counted (the right one signed in while the form said "locked") and `POST /auth/signin/email` sent
 * sign-in e-mails past every limit.
 *
 * Any other request under /auth/ skips Auth.js and reaches SvelteKit, which has no route there: the
 * ordinary 404 page, with its headers. Auth.js's session reader is not installed for those requests,
 * so they are answered as anonymous.
 */
export function onlyPublicAuthDoors(authHandle: Handle): Handle {
	return (input) => {
		const { event, resolve } = input;
		const { pathname } = event.url;
		if (!pathname.startsWith(AUTH_BASE) || isPublicAuthDoor(event.request.method, pathname))
			return authHandle(input);
		event.locals.auth = async () => null;
		return resolve(event);
	};
}
