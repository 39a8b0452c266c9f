import type { Handle } from '@sveltejs/kit';
import { apiError } from '../api';
import { userForApiToken } from '../auth/api-tokens';
import { cookiePolicy, holdAuthCookiesToPolicy } from '../auth/cookie-policy';
import { userForSession } from '../auth/sessions';

/** Who is asking: a Bearer token (API scripts) or the Auth.js session cookie (the browser). */
export const identify: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.via = null;
	event.locals.sessionId = null;
	const header = event.request.headers.get('authorization');
	if (header?.toLowerCase().startsWith('bearer ')) {
		const user = await userForApiToken(header.slice(7).trim());
		if (!user) {
			return apiError(401, 'invalid_token', 'That API token is unknown or has been revoked.');
		}
		event.locals.user = user;
		event.locals.via = 'token';
		return resolve(event);
	}
	holdAuthCookiesToPolicy(event.cookies);
	const session = await event.locals.auth();
	const userId = session?.user?.id;
	if (userId) {
		// A signed cookie is not enough: its session must still exist (not signed out, not ended
		// by a password change), which every server reads from the same database.
		const sessionId = session.sessionId ?? '';
		const user = await userForSession(sessionId, userId);
		if (user) {
			event.locals.user = user;
			event.locals.via = 'session';
			event.locals.sessionId = sessionId;
		} else {
			event.cookies.delete(cookiePolicy.sessionCookieName, { path: '/' });
		}
	}
	return resolve(event);
};
