import type { Handle } from '@sveltejs/kit';
import { apiError } from '../api';
import { userForApiToken } from '../auth/api-tokens';
import { dbReady, User } from '../db';

/** Who is asking: a Bearer token (API scripts) or the Auth.js session cookie (the browser). */
export const identify: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.via = null;
	const header = event.request.headers.get('authorization');
	if (header?.toLowerCase().startsWith('bearer ')) {
		const user = await userForApiToken(header.slice(7).trim());
		if (!user)
			return apiError(401, 'invalid_token', 'That API token is unknown or has been revoked.');
		event.locals.user = user;
		event.locals.via = 'token';
		return resolve(event);
	}
	const session = await event.locals.auth();
	const userId = session?.user?.id;
	if (userId) {
		await dbReady();
		const user = await User.findByPk(userId, { attributes: ['id', 'email', 'name'] });
		if (user) {
			event.locals.user = { id: user.id, email: user.email, name: user.name };
			event.locals.via = 'session';
		}
	}
	return resolve(event);
};
