import { SvelteKitAuth } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import { verifyCredentials } from './credentials';

const TWELVE_HOURS = 12 * 60 * 60;

/**
 * Auth.js with e-mail and password only. The JWT carries just the user id; roles are looked up
 * per request and per team (guards.ts), so a role change applies on the next click.
 */
export const {
	handle: authHandle,
	signIn,
	signOut
} = SvelteKitAuth({
	providers: [
		Credentials({
			credentials: { email: { label: 'E-mail' }, password: { label: 'Password', type: 'password' } },
			authorize: (credentials) => verifyCredentials(credentials.email, credentials.password)
		})
	],
	session: { strategy: 'jwt', maxAge: TWELVE_HOURS },
	pages: { signIn: '/signin', error: '/signin' },
	trustHost: true,
	callbacks: {
		jwt({ token, user }) {
			if (user?.id) token.uid = user.id;
			return token;
		},
		session({ session, token }) {
			if (typeof token.uid === 'string') session.user.id = token.uid;
			return session;
		}
	},
	logger: {
		error(error) {
			// A wrong password is an expected outcome, shown on the form; not a server error.
			if (error.name === 'CredentialsSignin') return;
			console.error('[auth]', error);
		}
	}
});
