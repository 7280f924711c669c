import { createHash, randomBytes } from 'node:crypto';

/** A random URL-safe token for an e-mailed link; only its SHA-256 is stored, so a leaked table opens nothing. */
export function newToken(): { token: string; tokenHash: string } {
	const token = randomBytes(32).toString('base64url');
	return { token, tokenHash: hashToken(token) };
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const HOUR_MS = 60 * 60 * 1000;
