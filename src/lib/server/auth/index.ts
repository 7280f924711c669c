import type { Adapter } from '@auth/sveltekit/adapters';
import { DrizzleAdapter } from '@auth/drizzle-adapter';
import { SvelteKitAuth } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import Nodemailer from '@auth/sveltekit/providers/nodemailer';
import { db } from '../db';
import { accounts, sessions, users, verificationTokens } from '../db/schema';
import { logger } from '../log';
import { mailServer, sendMail } from '../mail';
import { accountWithPassword } from '../accounts/sign-in';
import { addressProvenBySignInLink } from '../accounts/sign-up';
import { extendSession, revokeSession, SESSION_MAX_AGE_S, startSession } from './sessions';
import { signInSchema } from '$lib/forms/auth.schema';
import { safeNext } from '$lib/safe-next';

const drizzle = DrizzleAdapter(db, {
	usersTable: users,
	accountsTable: accounts,
	sessionsTable: sessions,
	verificationTokensTable: verificationTokens
});

/**
 * The Drizzle adapter, except that proving an address with an e-mailed sign-in link never adopts what an
 * unconfirmed sign-up set: Auth.js calls `updateUser` with `emailVerified` when such a link is used, and
 * first the account drops any pending password and sign-up links (see accounts/sign-up.ts).
 */
const adapter: Adapter = {
	...drizzle,
	async updateUser(user) {
		if (user.emailVerified) await addressProvenBySignInLink(user.id);
		return drizzle.updateUser!(user);
	}
};

export const {
	handle: authHandle,
	signIn,
	signOut
} = SvelteKitAuth({
	adapter,
	// The credentials provider only works with JWT sessions; the adapter still keeps users and magic-link
	// tokens. Each JWT names a row in user_session, so a session can still be ended (auth/sessions.ts).
	session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
	trustHost: true,
	pages: { signIn: '/signin', verifyRequest: '/signin/check-email', error: '/signin/problem' },
	providers: [
		Credentials({
			id: 'password',
			credentials: { email: {}, password: {} },
			async authorize(raw) {
				const parsed = signInSchema.safeParse(raw);
				if (!parsed.success) return null;
				const user = await accountWithPassword(parsed.data.email, parsed.data.password);
				// Password sign-in waits for the address to be confirmed (the sign-in action explains this).
				if (!user?.emailVerified) return null;
				return { id: user.id, email: user.email, name: user.name };
			}
		}),
		Nodemailer({
			id: 'email',
			server: mailServer,
			from: 'Runrate <no-reply@runrate.example.org>',
			maxAge: 30 * 60,
			async sendVerificationRequest({ identifier, url }) {
				await sendMail({
					to: identifier,
					subject: 'Your Runrate sign-in link',
					text: `Open this link to sign in to Runrate. It works once and for 30 minutes:\n\n${url}\n\nIf you did not ask for it, ignore this message: nobody can sign in without the link.`
				});
			}
		})
	],
	callbacks: {
		// Every redirect Auth.js makes (callbackUrl from a form, a link or its cookie) stays on this site.
		redirect: ({ url, baseUrl }) => baseUrl + safeNext(url, '/', baseUrl),
		/**
		 * At sign-in (`user` is set) the token gets a new session id; later reads keep its row's expiry in
		 * step. A failed extension is only logged: Auth.js would clear the cookie on any error here, and a
		 * database outage must answer 503 (hooks.server.ts), not sign people out.
		 */
		async jwt({ token, user }) {
			if (user?.id) token.sid = await startSession(user.id);
			else if (typeof token.sid === 'string')
				await extendSession(token.sid).catch((error: unknown) =>
					logger.warn({ err: error }, 'could not extend a session; the next read tries again')
				);
			return token;
		},
		session({ session, token }) {
			if (token.sub) session.user.id = token.sub;
			if (typeof token.sid === 'string') session.sid = token.sid;
			return session;
		}
	},
	events: {
		/** Every sign-out through Auth.js (our /signout action included) ends that session's row. */
		async signOut(message) {
			const sid = 'token' in message ? message.token?.sid : undefined;
			if (typeof sid === 'string') await revokeSession(sid);
		}
	}
});
