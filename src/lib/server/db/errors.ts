// postgres.js and Node report an unreachable database with these codes; drizzle wraps them in `cause`.
const CONNECTION_CODES = new Set([
	'ECONNREFUSED',
	'ECONNRESET',
	'ETIMEDOUT',
	'EPIPE',
	'CONNECT_TIMEOUT',
	'CONNECTION_CLOSED',
	'CONNECTION_ENDED',
	'CONNECTION_DESTROYED',
	'57P01', // admin_shutdown
	'57P02', // crash_shutdown
	'57P03' // cannot_connect_now
]);

/** True when the error (or any of its causes) says the database is unreachable rather than the query wrong. */
export function isDatabaseUnavailable(error: unknown): boolean {
	for (let e = error, depth = 0; e && depth < 6; depth++) {
		if (typeof e !== 'object') return false;
		const { code, errors, cause } = e as { code?: unknown; errors?: unknown[]; cause?: unknown };
		if (typeof code === 'string' && CONNECTION_CODES.has(code)) return true;
		if (Array.isArray(errors) && errors.some(isDatabaseUnavailable)) return true;
		e = cause;
	}
	return false;
}
