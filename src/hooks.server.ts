import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { codeForStatus, apiError } from '$lib/server/api';
import { authHandle } from '$lib/server/auth/auth';
import { userForApiToken } from '$lib/server/auth/api-tokens';
import { isApiPath } from '$lib/server/auth/guards';
import { takeSignInAttempt } from '$lib/server/auth/rate-limit';
import { dbReady, User } from '$lib/server/db';
import { seedDemoIfEmpty } from '$lib/server/db/seed-demo';
import { paths } from '$lib/paths';

export const init: ServerInit = async () => {
	await dbReady();
	if (process.env.ORTHOGON_DEMO !== '0') await seedDemoIfEmpty();
};

/** Pages anyone may open without signing in. */
const PUBLIC_PAGES = [/^\/signin\/?$/, /^\/set-password\//, /^\/auth\//];

const identify: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.via = null;
	const header = event.request.headers.get('authorization');
	if (header?.toLowerCase().startsWith('bearer ')) {
		const user = await userForApiToken(header.slice(7).trim());
		if (!user) return apiError(401, 'invalid_token', 'That API token is unknown or has been revoked.');
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

// Scripted sign-ins post straight to Auth.js and skip the sign-in page's action, so the same
// limits are applied here.
const limitScriptedSignIn: Handle = async ({ event, resolve }) => {
	if (event.request.method === 'POST' && event.url.pathname === '/auth/callback/credentials') {
		const form = await event.request.clone().formData().catch(() => null);
		const email = String(form?.get('email') ?? '');
		const verdict = await takeSignInAttempt(email, event.getClientAddress());
		if (!verdict.allowed) {
			return new Response('Too many sign-in attempts. Try again later.', {
				status: 429,
				headers: { 'retry-after': String(verdict.retryAfterSeconds) }
			});
		}
	}
	return resolve(event);
};

const guardPages: Handle = async ({ event, resolve }) => {
	const { pathname } = event.url;
	if (event.locals.user || PUBLIC_PAGES.some((p) => p.test(pathname))) return resolve(event);
	if (isApiPath(event.url)) {
		return apiError(401, 'unauthenticated', 'Sign in, or send an API token as a Bearer token.');
	}
	return new Response(null, {
		status: 303,
		headers: { location: paths.signIn(pathname + event.url.search) }
	});
};

// Kit answers some API requests itself (unknown method, 404); give those the API error shape too.
const shapeApiErrors: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	if (!isApiPath(event.url) || response.ok || response.status < 400) return response;
	if (response.headers.get('content-type')?.includes('application/json')) {
		const body = await response.clone().json().catch(() => null);
		if (body && typeof body === 'object' && 'error' in body) return response;
	}
	const message = response.status === 405 ? `${event.request.method} is not allowed here.` : 'Request failed.';
	const shaped = apiError(response.status, codeForStatus(response.status), message);
	const allow = response.headers.get('allow');
	if (allow) shaped.headers.set('allow', allow);
	return shaped;
};

const SECURITY_HEADERS = { 'x-content-type-options': 'nosniff', 'referrer-policy': 'same-origin' };

const securityHeaders: Handle = async ({ event, resolve }) => {
	let response = await resolve(event);
	try {
		for (const [name, value] of Object.entries(SECURITY_HEADERS)) response.headers.set(name, value);
	} catch {
		// Response.redirect() (used inside Auth.js) has immutable headers: copy it first.
		response = new Response(response.body, response);
		for (const [name, value] of Object.entries(SECURITY_HEADERS)) response.headers.set(name, value);
	}
	return response;
};

export const handle = sequence(securityHeaders, limitScriptedSignIn, authHandle, identify, guardPages, shapeApiErrors);

export const handleError: HandleServerError = ({ error, status, message }) => {
	if (status !== 404) console.error('[server]', error);
	return { message: status === 404 ? 'Page not found.' : message, code: codeForStatus(status) };
};
