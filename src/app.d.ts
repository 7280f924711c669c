import type { DefaultSession } from '@auth/sveltekit';

declare global {
	namespace App {
		interface Locals {
			/** The signed-in user, resolved once per request in hooks.server.ts; null when anonymous. */
			user: SessionUser | null;
			/** Where "Sites" leads the signed-in user, read with the session (`accounts/landing.ts`). */
			sitesHome: string | null;
			/** The live session's id (`auth/sessions.ts`) when signed in, so sign-out can end exactly it. */
			sessionId: string | null;
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
		/** The session's row in `user_session`; absent on tokens minted before sessions were recorded. */
		sid?: string;
	}
}

export {};
