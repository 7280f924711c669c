import { DrizzleAdapter } from '@auth/drizzle-adapter';
import { SvelteKitAuth } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import Nodemailer from '@auth/sveltekit/providers/nodemailer';
import { eq } from 'drizzle-orm';
import { db } from '../db';
import { accounts, sessions, users, verificationTokens } from '../db/schema';
import { mailServer, sendMail } from '../mail';
import { verifyPassword } from './password';
import { signInSchema } from '$lib/forms/auth.schema';
import { safeNext } from '$lib/safe-next';

export const {
	handle: authHandle,
	signIn,
	signOut
} = SvelteKitAuth({
	adapter: DrizzleAdapter(db, {
		usersTable: users,
		accountsTable: accounts,
		sessionsTable: sessions,
		verificationTokensTable: verificationTokens
	}),
	// The credentials provider only works with JWT sessions; the adapter still keeps users and magic-link tokens.
	session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
	trustHost: true,
	pages: { signIn: '/signin', verifyRequest: '/signin/check-email', error: '/signin/problem' },
	providers: [
		Credentials({
			id: 'password',
			credentials: { email: {}, password: {} },
			async authorize(raw) {
				const parsed = signInSchema.safeParse(raw);
				if (!parsed.success) return null;
				const [user] = await db.select().from(users).where(eq(users.email, parsed.data.email));
				if (!(await verifyPassword(parsed.data.password, user?.passwordHash))) return null;
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
		session({ session, token }) {
			if (token.sub) session.user.id = token.sub;
			return session;
		}
	}
});
