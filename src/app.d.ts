import type { DefaultSession } from '@auth/sveltekit';

declare global {
	namespace App {
		interface Locals {
			/** The signed-in user, resolved once per request in hooks.server.ts; null when anonymous. */
			user: SessionUser | null;
			/** Set by handleError when the database could not be reached, so the response becomes a 503. */
			databaseDown?: boolean;
		}
		interface Error {
			message: string;
			code?: string;
		}
		interface PageData {
			user?: SessionUser | null;
		}
	}

	interface SessionUser {
		id: string;
		email: string;
		name: string | null;
		isAdmin: boolean;
	}
}

declare module '@auth/sveltekit' {
	interface Session {
		user: { id: string } & DefaultSession['user'];
	}
}

export {};
