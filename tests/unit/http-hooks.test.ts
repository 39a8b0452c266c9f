import type { RequestEvent } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { checkFormOrigin } from '../../src/lib/server/hooks/form-origin';
import { securityHeaders } from '../../src/lib/server/hooks/security-headers';

const ORIGIN = 'https://orthogon.lab.example';
const someone = { id: 'u1', email: 'a@lab.example', name: 'A' };

function event(
	path: string,
	init: RequestInit = {},
	user: typeof someone | null = null
): RequestEvent {
	const url = new URL(path, ORIGIN);
	return {
		url,
		request: new Request(url, init),
		locals: { user, via: user ? 'session' : null }
	} as unknown as RequestEvent;
}

async function run(
	hook: typeof securityHeaders,
	e: RequestEvent,
	answer = () => new Response('ok')
) {
	let resolved = false;
	const response = await hook({
		event: e,
		resolve: async () => {
			resolved = true;
			return answer();
		}
	});
	return { response, resolved };
}

describe('security headers', () => {
	it('sends Permissions-Policy and Cross-Origin-Opener-Policy on every answer, even a redirect', async () => {
		for (const answer of [
			() => new Response('ok'),
			() => Response.redirect(`${ORIGIN}/signin`, 302)
		]) {
			const { response } = await run(securityHeaders, event('/signin'), answer);
			expect(response.headers.get('cross-origin-opener-policy')).toBe('same-origin');
			expect(response.headers.get('permissions-policy')).toMatch(
				/camera=\(\).*microphone=\(\).*geolocation=\(\)/
			);
		}
	});

	it('answers no-store to signed-in pages and to every API answer, but lets public pages be', async () => {
		const page = await run(securityHeaders, event('/projects', {}, someone));
		expect(page.response.headers.get('cache-control')).toBe('no-store');
		const api = await run(securityHeaders, event('/api/rules'), () =>
			Response.json({ error: { code: 'x', message: 'y' } }, { status: 401 })
		);
		expect(api.response.headers.get('cache-control')).toBe('no-store');
		const signIn = await run(securityHeaders, event('/signin'));
		expect(signIn.response.headers.get('cache-control')).toBeNull();
	});
});

const form = (body: BodyInit, headers: Record<string, string> = {}, method = 'POST') => ({
	method,
	body,
	headers
});

describe('form origin check (cookie sessions only)', () => {
	it('refuses a cross-site form post to a page with a plain-text 403', async () => {
		const e = event(
			'/projects?/create',
			form('name=x', {
				'content-type': 'application/x-www-form-urlencoded',
				origin: 'https://evil.example'
			}),
			someone
		);
		const { response, resolved } = await run(checkFormOrigin, e);
		expect(resolved).toBe(false);
		expect(response.status).toBe(403);
		expect(response.headers.get('content-type')).toMatch(/^text\/plain/);
		expect(await response.text()).toMatch(/Cross-site POST form submissions are forbidden/);
	});

	it('refuses a form post without Origin to the API in the API error shape', async () => {
		const body = new FormData();
		body.set('file', new Blob(['x']), 'a.sdf');
		const { response, resolved } = await run(
			checkFormOrigin,
			event('/api/projects/p/routes/import', form(body))
		);
		expect(resolved).toBe(false);
		expect(response.status).toBe(403);
		expect((await response.json()).error).toEqual({
			code: 'cross-site',
			message: expect.stringContaining(ORIGIN)
		});
	});

	it('lets a Bearer-token multipart upload without Origin through', async () => {
		const body = new FormData();
		body.set('file', new Blob(['x']), 'a.sdf');
		const e = event(
			'/api/projects/p/routes/import',
			form(body, { authorization: 'Bearer og_abc' })
		);
		expect((await run(checkFormOrigin, e)).resolved).toBe(true);
	});

	it('lets same-origin forms, JSON bodies and GETs through', async () => {
		const same = event(
			'/projects?/create',
			form('name=x', { 'content-type': 'application/x-www-form-urlencoded', origin: ORIGIN }),
			someone
		);
		expect((await run(checkFormOrigin, same)).resolved).toBe(true);
		const json = event('/api/check', form('{}', { 'content-type': 'application/json' }), someone);
		expect((await run(checkFormOrigin, json)).resolved).toBe(true);
		expect((await run(checkFormOrigin, event('/projects', {}, someone))).resolved).toBe(true);
	});
});
