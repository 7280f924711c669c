import { isRedirect, type RequestEvent } from '@sveltejs/kit';
import { safeNext } from '$lib/safe-next';
import { signIn, signOut } from './index';

/** The browser's headers (cookies, host) without the body's type and length, which belong to the new body. */
export function forwardedHeaders(request: Request): Headers {
	const headers = new Headers(request.headers);
	headers.delete('content-type');
	headers.delete('content-length');
	return headers;
}

/**
 * Hands an already-validated sign-in to Auth.js, which sets the session cookie and throws its redirect.
 * Returns false when Auth.js refused (its redirect carries `error=`), so the form can say why.
 * (Auth.js relies on SvelteKit's own origin check for these posts.)
 */
export async function handOver(
	event: RequestEvent,
	provider: 'password' | 'email',
	fields: Record<string, string>
) {
	const body = new FormData();
	body.set('providerId', provider);
	for (const [key, value] of Object.entries(fields)) if (key !== 'next') body.set(key, value);
	body.set('redirectTo', safeNext(fields.next));
	const request = new Request(event.request.url, {
		method: 'POST',
		headers: forwardedHeaders(event.request),
		body
	});
	try {
		await signIn({ ...event, request });
	} catch (error) {
		if (isRedirect(error) && error.location.includes('error=')) return false;
		throw error;
	}
	return true;
}

/** Clears this browser's Auth.js session cookie (Auth.js's signOut event also ends the session's row),
 * then Auth.js throws its redirect to `redirectTo`. */
export async function handOverSignOut(event: RequestEvent, redirectTo: string) {
	const body = new FormData();
	body.set('redirectTo', redirectTo);
	const request = new Request(event.request.url, {
		method: 'POST',
		headers: forwardedHeaders(event.request),
		body
	});
	await signOut({ ...event, request });
}
