import type { Handle } from '@sveltejs/kit';
import { apiError } from '../api';
import { withSignInContext } from '../auth/sign-in-context';

/** Auth.js answers everything under this prefix itself (its `basePath`). */
const AUTH_JS_PREFIX = '/auth/';

export const TOO_MANY_ATTEMPTS = 'Too many failed sign-in attempts. Try again later.';

// The limits themselves are applied inside Auth.js's `authorize` (auth/sign-in.ts), which every
// credentials sign-in passes whatever its path. This hook gives it the client's address, and turns
// a refused scripted attempt into 429 with `retry-after` (the sign-in page words its own answer).
export const limitScriptedSignIn: Handle = async ({ event, resolve }) => {
	if (event.request.method !== 'POST') {
		return resolve(event);
	}
	return withSignInContext(event.getClientAddress(), async (context) => {
		const response = await resolve(event);
		if (context.retryAfterSeconds === null || !event.url.pathname.startsWith(AUTH_JS_PREFIX)) {
			return response;
		}
		const refused = apiError(429, 'rate_limited', TOO_MANY_ATTEMPTS, {
			retryAfterSeconds: context.retryAfterSeconds
		});
		refused.headers.set('retry-after', String(context.retryAfterSeconds));
		return refused;
	});
};
