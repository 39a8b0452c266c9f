import { describe, expect, it } from 'vitest';
import { cookiePolicyFor } from '../../src/lib/server/auth/cookie-policy';

describe('one cookie policy from ORIGIN', () => {
	it('uses Secure, __Secure- named cookies when people reach Orthogon over https', () => {
		expect(cookiePolicyFor('https://orthogon.lab.example')).toEqual({
			useSecureCookies: true,
			sessionCookieName: '__Secure-authjs.session-token'
		});
	});

	it('uses plain cookies over http (a laptop, a test run) and when ORIGIN is unset (vite dev)', () => {
		for (const origin of ['http://localhost:3000', undefined, 'not a url']) {
			expect(cookiePolicyFor(origin)).toEqual({
				useSecureCookies: false,
				sessionCookieName: 'authjs.session-token'
			});
		}
	});
});
