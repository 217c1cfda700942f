// Sign-in with Auth.js: e-mail and password (Credentials), sessions as signed JWT cookies that
// carry the person's id and a stamp of their password. Roles are read fresh from the database on
// every request (hooks), so a change of roles takes effect at once; a password set again (after
// access was withdrawn) voids the sessions from before.
import { SvelteKitAuth, type SvelteKitAuthConfig } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { z } from 'zod';
import { emailAddress } from '$lib/schemas/email';
import { authSecret, config } from '$lib/server/config';
import { decoyHash, verifyPassword } from '$lib/server/passwords';
import { logOncePerMinute } from '$lib/server/log-once';
import { findUserByEmail, passwordStamp } from '$lib/server/users';

export const credentialsSchema = z.object({
	email: emailAddress,
	password: z.string().min(1, 'Enter your password.').max(200, 'That password is too long.')
});

// Built on first use (never while building) and then kept: Auth.js asks for it on every request.
let built: SvelteKitAuthConfig | undefined;

export const { handle, signIn, signOut } = SvelteKitAuth(async () => (built ??= authConfig()));

function authConfig(): SvelteKitAuthConfig {
	return {
		secret: authSecret(),
		// @auth/sveltekit 1.11 ignores AUTH_TRUST_HOST in production; SvelteKit's origin check and
		// adapter-node's ORIGIN decide which host we answer for.
		trustHost: true,
		useSecureCookies: config().origin.startsWith('https:'),
		logger: {
			error(e) {
				// A wrong password is an expected event, counted by the sign-in limit, not an error.
				if (e.name === 'CredentialsSignin') return;
				// Anyone can send a damaged session cookie on every request (it counts as signed
				// out and the answer clears it): one short line per cause a minute, not a stack each.
				const cause = e.cause instanceof Error ? e.cause.message : '';
				const line = `[auth] ${e.name}${cause ? `: ${cause}` : ''}`;
				logOncePerMinute(line, line, console.error);
			}
		},
		session: { strategy: 'jwt', maxAge: 14 * 24 * 60 * 60 },
		pages: { signIn: '/signin', error: '/signin' },
		providers: [
			Credentials({
				credentials: { email: {}, password: {} },
				async authorize(raw) {
					const parsed = credentialsSchema.safeParse(raw);
					if (!parsed.success) return null;
					const user = findUserByEmail(parsed.data.email);
					if (!user?.passwordHash) {
						await verifyPassword(await decoyHash(), parsed.data.password);
						return null;
					}
					if (!(await verifyPassword(user.passwordHash, parsed.data.password))) return null;
					// The stamp goes into the token: a password set later voids this session.
					const signedIn = {
						id: String(user.id),
						email: user.email,
						name: user.name,
						pw: passwordStamp(user.passwordHash)
					};
					return signedIn;
				}
			})
		],
		callbacks: {
			jwt({ token, user }) {
				if (user?.id) {
					token.uid = Number(user.id);
					token.pw = (user as { pw?: string }).pw;
				}
				return token;
			},
			session({ session, token }) {
				return {
					...session,
					uid: typeof token.uid === 'number' ? token.uid : null,
					pw: typeof token.pw === 'string' ? token.pw : null
				};
			}
		}
	};
}
