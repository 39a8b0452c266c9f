import { describe, expect, it } from 'vitest';
import type { Cookies } from '@sveltejs/kit';
import { cookiePolicyFor, holdAuthCookiesToPolicy } from '../../src/lib/server/auth/cookie-policy';

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

describe('cookies refreshed through SvelteKit follow the same policy', () => {
	function recordingCookies() {
		const seen: Record<string, unknown>[] = [];
		const cookies = {
			set: (_n: string, _v: string, options: Record<string, unknown>) => seen.push(options)
		};
		return { cookies: cookies as unknown as Cookies, seen };
	}

	it('states secure: false over http, where SvelteKit would otherwise mark the cookie Secure', () => {
		const { cookies, seen } = recordingCookies();
		holdAuthCookiesToPolicy(cookies, cookiePolicyFor('http://orthogon.lab.example'));
		cookies.set('authjs.session-token', 'jwt', { path: '/', httpOnly: true });
		expect(seen).toEqual([{ path: '/', httpOnly: true, secure: false }]);
	});

	it('states secure: true over https and leaves other cookies alone', () => {
		const { cookies, seen } = recordingCookies();
		holdAuthCookiesToPolicy(cookies, cookiePolicyFor('https://orthogon.lab.example'));
		cookies.set('__Secure-authjs.session-token', 'jwt', { path: '/' });
		cookies.set('theme', 'dark', { path: '/' });
		expect(seen).toEqual([{ path: '/', secure: true }, { path: '/' }]);
	});
});
