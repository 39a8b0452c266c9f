import type { Handle } from '@sveltejs/kit';
import { apiError } from '../api';
import { isApiPath } from '../auth/guards';
import { paths } from '../../paths';

/** Pages anyone may open without signing in. */
const PUBLIC_PAGES = [/^\/signin\/?$/, /^\/set-password\//, /^\/auth\//];

/** No identity: pages send people to sign in, the API answers 401. */
export const guardPages: Handle = async ({ event, resolve }) => {
	const { pathname } = event.url;
	if (event.locals.user || PUBLIC_PAGES.some((p) => p.test(pathname))) {
		return resolve(event);
	}
	if (isApiPath(event.url)) {
		return apiError(401, 'unauthenticated', 'Sign in, or send an API token as a Bearer token.');
	}
	return new Response(null, {
		status: 303,
		headers: { location: paths.signIn(pathname + event.url.search) }
	});
};
