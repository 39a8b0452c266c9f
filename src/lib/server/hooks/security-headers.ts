import type { Handle } from '@sveltejs/kit';
import { isApiPath } from '../auth/guards';
import { withHeaders } from './response-headers';

/** Powerful browser features Orthogon never uses, denied to the page and anything it embeds. */
const DENIED_FEATURES = [
	'camera',
	'microphone',
	'geolocation',
	'payment',
	'usb',
	'serial',
	'bluetooth',
	'hid',
	'midi',
	'display-capture',
	'accelerometer',
	'gyroscope',
	'magnetometer'
];

/** Sent on every answer. */
export const SECURITY_HEADERS: Record<string, string> = {
	'x-content-type-options': 'nosniff',
	'referrer-policy': 'same-origin',
	'permissions-policy': DENIED_FEATURES.map((feature) => `${feature}=()`).join(', '),
	'cross-origin-opener-policy': 'same-origin'
};

/**
 * Security headers on every answer; `Cache-Control: no-store` on every API answer and every
 * answer to someone signed in, so a shared computer's cache or a proxy keeps no team's data.
 * An answer that chose its own caching keeps it.
 */
export const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const private_ = Boolean(event.locals.user) || isApiPath(event.url);
	const caching: Record<string, string> =
		private_ && !response.headers.has('cache-control') ? { 'cache-control': 'no-store' } : {};
	return withHeaders(response, { ...SECURITY_HEADERS, ...caching });
};
