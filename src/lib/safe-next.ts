/** Any origin works as the base: only "did the value stay on it?" matters, not which origin it is. */
const PLACEHOLDER_ORIGIN = 'https://runrate.invalid';
/** Longer values are not a page of ours; refusing them keeps the Location header small. */
const MAX_LENGTH = 2048;

/**
 * Only paths on this site: an open redirect would let a crafted link send people elsewhere after sign-in.
 * The value is resolved the way a browser resolves a Location header (`new URL`, which drops tabs and
 * newlines and reads `\` as `/`), so `/\t/evil.example` is seen as the `//evil.example` a browser would
 * follow. It is kept only if it stays on our origin and its path starts with a single `/`; the answer is
 * the URL's own percent-encoded path, query and fragment, so control and non-Latin characters can never
 * make an invalid header. With `origin`, an absolute URL on that origin is accepted too (Auth.js's
 * callback URLs); otherwise only values starting with `/` are.
 */
export function safeNext(next: string | null | undefined, fallback = '/workspaces', origin?: string): string {
	if (typeof next !== 'string' || next.length === 0 || next.length > MAX_LENGTH) return fallback;
	const base = origin ?? PLACEHOLDER_ORIGIN;
	if (!next.startsWith('/') && !(origin && next.startsWith(`${origin}/`))) return fallback;
	let url: URL;
	try {
		url = new URL(next, base);
	} catch {
		return fallback;
	}
	if (url.origin !== new URL(base).origin || url.username || url.password) return fallback;
	if (!url.pathname.startsWith('/') || url.pathname.startsWith('//')) return fallback;
	return url.pathname + url.search + url.hash;
}
