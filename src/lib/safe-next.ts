/** Only paths on this site: an open redirect would let a crafted link send people elsewhere after sign-in. */
export function safeNext(next: string | null | undefined, fallback = '/workspaces'): string {
	return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : fallback;
}
