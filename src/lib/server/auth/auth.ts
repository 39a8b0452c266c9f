import { SvelteKitAuth } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { safeRedirectTarget } from '../../paths';
import { cookiePolicy } from './cookie-policy';
import { decodeSessionToken, encodeSessionToken } from './session-token-cache';
import { endSession, SESSION_MAX_AGE_SECONDS, startSession } from './sessions';
import { authorizeSignIn } from './sign-in';

/**
 * Auth.js with e-mail and password only. The JWT carries the user id and the id of a session row
 * (sessions.ts): a request counts as signed in only while that row exists, so sign-out and a
 * password change end sessions on every server. Roles are looked up per request and per team
 * (guards.ts), so a role change applies on the next click.
 */
export const {
	handle: authHandle,
	signIn,
	signOut
} = SvelteKitAuth({
	providers: [
		Credentials({
			credentials: {
				email: { label: 'E-mail' },
				password: { label: 'Password', type: 'password' }
			},
			authorize: (credentials) => authorizeSignIn(credentials.email, credentials.password)
		})
	],
	session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_SECONDS },
	jwt: { encode: encodeSessionToken, decode: decodeSessionToken },
	useSecureCookies: cookiePolicy.useSecureCookies,
	pages: { signIn: '/signin', error: '/signin' },
	trustHost: true,
	callbacks: {
		async jwt({ token, user }) {
			if (user?.id) {
				token.uid = user.id;
				token.sid = await startSession(user.id);
			}
			return token;
		},
		session({ session, token }) {
			if (typeof token.uid === 'string') {
				session.user.id = token.uid;
			}
			if (typeof token.sid === 'string') {
				session.sessionId = token.sid;
			}
			return session;
		},
		// Scripted sign-ins name their own callbackUrl; the same same-origin rule as the page's.
		redirect({ url, baseUrl }) {
			const path = url.startsWith(baseUrl) ? url.slice(baseUrl.length) || '/' : url;
			return baseUrl + safeRedirectTarget(path);
		}
	},
	events: {
		async signOut(message) {
			const sid = 'token' in message ? message.token?.sid : undefined;
			if (typeof sid === 'string') {
				await endSession(sid);
			}
		}
	},
	logger: {
		error(error) {
			// A wrong password is an expected outcome, shown on the form; not a server error.
			if (error.name === 'CredentialsSignin') {
				return;
			}
			console.error('[auth]', error);
		}
	}
});
