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
