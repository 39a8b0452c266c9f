import type { Handle, RequestEvent } from '@sveltejs/kit';
import { apiError } from '../api';
import { isApiPath } from '../auth/guards';

/** The content types a browser form (or a cross-site page) can send without a CORS preflight. */
const FORM_CONTENT_TYPES = [
	'application/x-www-form-urlencoded',
	'multipart/form-data',
	'text/plain'
];
const UNSAFE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'];

/** The request's media type without parameters, e.g. `multipart/form-data`; '' when absent. */
export function mediaType(request: Request): string {
	const [type = ''] = (request.headers.get('content-type') ?? '').split(';');
	return type.trim().toLowerCase();
}

function isBearer(event: RequestEvent): boolean {
	return /^bearer\s/i.test(event.request.headers.get('authorization') ?? '');
}

/** True when the request could be a cross-site form post riding on the session cookie. */
export function needsSameOrigin(event: RequestEvent): boolean {
	if (!UNSAFE_METHODS.includes(event.request.method) || isBearer(event)) {
		return false;
	}
	return FORM_CONTENT_TYPES.includes(mediaType(event.request));
}

/**
 * Kit's own form-origin check (turned off in svelte.config.js) also refused API scripts, which
 * send a Bearer token and no Origin. A cross-site page cannot add an Authorization header to a
 * simple form post, so the check is kept for everything else: cookie sessions and anonymous
 * posts such as sign-in. The allowed origin is the app's own (ORIGIN, in production).
 */
export const checkFormOrigin: Handle = async ({ event, resolve }) => {
	if (!needsSameOrigin(event) || event.request.headers.get('origin') === event.url.origin) {
		return resolve(event);
	}
	const message = `Cross-site ${event.request.method} form submissions are forbidden: the Origin header must be ${event.url.origin}. Scripts send an API token as a Bearer token instead.`;
	if (isApiPath(event.url)) {
		return apiError(403, 'cross-site', message);
	}
	return new Response(message, {
		status: 403,
		headers: { 'content-type': 'text/plain; charset=utf-8' }
	});
};
