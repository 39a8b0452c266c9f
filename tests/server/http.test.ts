import { Agent, request as httpRequest } from 'node:http';
import path from 'node:path';
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freePort, signInCookie, startBuiltServer } from '../../scripts/built-server.js';

// The HTTP behaviour of the real server (adapter-node, Kit's own checks, our hooks together).
type Server = Awaited<ReturnType<typeof startBuiltServer>>;
let server: Server;
let cookie = '';
beforeAll(async () => {
	const dataDir = path.resolve('test-results/http-data');
	fs.rmSync(dataDir, { recursive: true, force: true });
	server = await startBuiltServer({ dataDir, port: await freePort() });
	cookie = await signInCookie(server.origin, 'chemist@example.com');
});
afterAll(async () => {
	await server?.stop();
});

type Answer = { status: number; headers: Record<string, string | string[] | undefined> };
function send(
	agent: Agent,
	method: string,
	pathname: string,
	body?: Buffer,
	headers: Record<string, string> = {}
): Promise<Answer> {
	return new Promise((resolve, reject) => {
		const url = new URL(pathname, server.origin);
		const req = httpRequest(
			{
				host: url.hostname,
				port: url.port,
				path: url.pathname + url.search,
				method,
				agent,
				headers: { cookie, ...headers, ...(body ? { 'content-length': String(body.length) } : {}) }
			},
			(res) => {
				res.resume();
				res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers }));
			}
		);
		req.setTimeout(10_000, () => req.destroy(new Error(`no answer to ${method} ${pathname}`)));
		req.on('error', reject);
		req.end(body);
	});
}

describe('the built server', () => {
	it('answers a 413 before reading a large body and the keep-alive client goes on working', async () => {
		const agent = new Agent({ keepAlive: true, maxSockets: 1 });
		const big = Buffer.alloc(3 * 1024 * 1024, 0x20);
		const refused = await send(agent, 'POST', '/api/check', big, {
			'content-type': 'application/json'
		});
		expect(refused.status).toBe(413);
		expect(refused.headers.connection).toBe('close');
		expect((await send(agent, 'GET', '/api/projects')).status).toBe(200);
		agent.destroy();
	});

	it('sends the security headers, and no-store on API answers and signed-in pages', async () => {
		const agent = new Agent();
		for (const pathname of ['/api/projects', '/projects', '/signin']) {
			const { headers } = await send(agent, 'GET', pathname);
			expect(headers['cross-origin-opener-policy'], pathname).toBe('same-origin');
			expect(headers['permissions-policy'], pathname).toMatch(/camera=\(\)/);
		}
		expect((await send(agent, 'GET', '/api/projects')).headers['cache-control']).toBe('no-store');
		expect((await send(agent, 'GET', '/projects')).headers['cache-control']).toBe('no-store');
	});

	it('answers 404 for ids that are not UUIDs, on pages and in the API', async () => {
		const agent = new Agent();
		for (const pathname of [
			'/teams/1',
			'/projects/abc',
			'/routes/x',
			'/api/routes/1',
			'/api/projects/abc/routes'
		]) {
			expect((await send(agent, 'GET', pathname)).status, pathname).toBe(404);
		}
	});

	it('refuses text/plain on sign-out with 415 and cross-site form posts with 403', async () => {
		const agent = new Agent();
		const plain = await send(agent, 'POST', '/signout', Buffer.from('x'), {
			'content-type': 'text/plain',
			origin: server.origin
		});
		expect(plain.status).toBe(415);
		const crossSite = await send(agent, 'POST', '/projects?/create', Buffer.from('name=x'), {
			'content-type': 'application/x-www-form-urlencoded',
			origin: 'https://evil.example'
		});
		expect(crossSite.status).toBe(403);
	});
});
