import type { Handle } from '@sveltejs/kit';
import { takeSignInAttempt } from '../auth/rate-limit';

// Scripted sign-ins post straight to Auth.js and skip the sign-in page's action, so the same
// limits are applied here.
export const limitScriptedSignIn: Handle = async ({ event, resolve }) => {
	if (event.request.method === 'POST' && event.url.pathname === '/auth/callback/credentials') {
		const form = await event.request
			.clone()
			.formData()
			.catch(() => null);
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
