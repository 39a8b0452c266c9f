import { createHash, randomUUID } from 'node:crypto';
import { Agent, request as httpRequest } from 'node:http';
import path from 'node:path';
import fs from 'node:fs';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freePort, signInCookie, startBuiltServer } from '../../scripts/built-server.js';

// The HTTP behaviour of the real server (adapter-node, Kit's own checks, our hooks together).
type Server = Awaited<ReturnType<typeof startBuiltServer>>;
let server: Server;
let cookie = '';
const dataDir = path.resolve('test-results/http-data');
beforeAll(async () => {
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

/** An API token for a demo person, written straight into the database (as the Account page would). */
function insertApiToken(email: string): Promise<string> {
	const token = `ogt_${randomUUID().replace(/-/g, '')}`;
	const now = new Date().toISOString().replace('T', ' ').replace('Z', ' +00:00');
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(path.join(dataDir, 'orthogon.db'), (err) => {
			if (err) {
				return reject(err);
			}
			db.run(
				`INSERT INTO api_tokens (id, userId, label, tokenHash, prefix, createdAt, updatedAt)
				 SELECT ?, id, 'server test', ?, ?, ?, ? FROM users WHERE email = ?`,
				[
					randomUUID(),
					createHash('sha256').update(token).digest('hex'),
					token.slice(0, 10),
					now,
					now,
					email
				],
				(error) => {
					db.close();
					if (error) {
						reject(error);
					} else {
						resolve(token);
					}
				}
			);
		});
	});
}

describe('the built server', () => {
	it('takes a Bearer-token multipart import without Origin, and refuses the same post on a cookie', async () => {
		const token = await insertApiToken('chemist@example.com');
		const listed = await fetch(`${server.origin}/api/projects`, {
			headers: { authorization: `Bearer ${token}` }
		});
		const projectId = (await listed.json()).projects[0].id;
		const upload = () => {
			const form = new FormData();
			const doc = { name: 'Imported', intermediates: [{ id: 'a', structure: 'CCO' }], steps: [] };
			form.set('file', new Blob([JSON.stringify(doc)], { type: 'application/json' }), 'route.json');
			return form;
		};
		const url = `${server.origin}/api/projects/${projectId}/routes/import`;
		// Node's fetch sends no Origin header, like curl or a script.
		const byToken = await fetch(url, {
			method: 'POST',
			headers: { authorization: `Bearer ${token}` },
			body: upload()
		});
		expect(byToken.status).toBe(201);
		const byCookie = await fetch(url, { method: 'POST', headers: { cookie }, body: upload() });
		expect(byCookie.status).toBe(403);
		expect((await byCookie.json()).error.code).toBe('cross-site');
	});

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
