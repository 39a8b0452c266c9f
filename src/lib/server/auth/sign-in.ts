import { verifyCredentials, type SessionUser } from './credentials';
import { settleSignInAttempt, takeSignInAttempt } from './rate-limit';
import { currentSignInContext } from './sign-in-context';

// Requests outside a sign-in context (none today) share one count rather than escape the limit.
const UNKNOWN_ADDRESS = 'unknown';

/**
 * Auth.js's `authorize` for e-mail and password: the one place every sign-in passes, whichever
 * path reached Auth.js (`/auth/callback/credentials`, with a trailing slash, …) and whether it came
 * from the sign-in page or a script. Counts failures and refuses while a limit is spent.
 */
export async function authorizeSignIn(
	email: unknown,
	password: unknown
): Promise<SessionUser | null> {
	const context = currentSignInContext();
	const address = context?.address ?? UNKNOWN_ADDRESS;
	const emailText = typeof email === 'string' ? email : '';
	const allowance = await takeSignInAttempt(emailText, address);
	if (!allowance.allowed) {
		if (context) {
			context.retryAfterSeconds = allowance.retryAfterSeconds;
		}
		return null;
	}
	const user = await verifyCredentials(email, password);
	await settleSignInAttempt(emailText, address, user !== null);
	return user;
}
