import type { Cookies } from '@sveltejs/kit';

/**
 * One cookie policy for every Auth.js cookie, derived from `ORIGIN` (the address people use):
 * https → `Secure` cookies with the `__Secure-` name. Left to itself Auth.js decides per request
 * from the URL it computes (including `x-forwarded-proto`), so sign-in and refresh could disagree.
 */
export function cookiePolicyFor(origin: string | undefined) {
	let secure = false;
	try {
		secure = origin ? new URL(origin).protocol === 'https:' : false;
	} catch {
		// An unreadable ORIGIN fails SvelteKit's own start-up; no cookie decision rests on it.
	}
	return {
		useSecureCookies: secure,
		// Auth.js's own naming for the session cookie (@auth/core defaultCookies).
		sessionCookieName: `${secure ? '__Secure-' : ''}authjs.session-token`
	};
}

export const cookiePolicy = cookiePolicyFor(process.env.ORIGIN);

/**
 * @auth/sveltekit refreshes the session cookie through SvelteKit's `cookies.set` without saying
 * `secure`, and SvelteKit then marks it Secure on any host but localhost, so over plain http the
 * refreshed cookie differed from the one set at sign-in (and a browser would drop it). Auth.js
 * cookies set on these `cookies` get the policy's `secure` unless they state their own.
 */
export function holdAuthCookiesToPolicy(cookies: Cookies, policy = cookiePolicy): void {
	const set = cookies.set.bind(cookies);
	cookies.set = (name, value, options) =>
		set(
			name,
			value,
			name.includes('authjs.')
				? { ...options, secure: options?.secure ?? policy.useSecureCookies }
				: options
		);
}
