/** The headers every answer carries (OWASP Secure Headers Project recommendations); the script policy is SvelteKit's. */
const SECURITY_HEADERS: [string, string][] = [
	['X-Content-Type-Options', 'nosniff'],
	['Referrer-Policy', 'strict-origin-when-cross-origin'],
	['X-Frame-Options', 'DENY']
];

/**
 * Adds the security headers to any response. Some responses have immutable headers — Auth.js answers
 * its error redirects with `Response.redirect()` — and setting a header on them throws, which turned
 * every such redirect (a used sign-in link) into a bare 500. Those are copied first: same status, body
 * and headers, now mutable.
 */
export function withSecurityHeaders(response: Response): Response {
	const out = hasMutableHeaders(response) ? response : new Response(response.body, response);
	for (const [name, value] of SECURITY_HEADERS) out.headers.set(name, value);
	return out;
}

/** Fetch's Headers has no "is immutable" flag: trying a harmless write (one we make anyway) is the test. */
function hasMutableHeaders(response: Response): boolean {
	try {
		response.headers.set(...SECURITY_HEADERS[0]!);
		return true;
	} catch {
		return false;
	}
}
