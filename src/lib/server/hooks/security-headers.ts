import type { Handle } from '@sveltejs/kit';

const SECURITY_HEADERS = { 'x-content-type-options': 'nosniff', 'referrer-policy': 'same-origin' };

export const securityHeaders: Handle = async ({ event, resolve }) => {
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
