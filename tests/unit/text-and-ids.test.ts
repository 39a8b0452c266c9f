import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as createProject } from '../../src/routes/api/projects/+server';
import { POST as createRoute } from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import { match as isUuid } from '../../src/params/uuid';
import { match as isRank } from '../../src/params/rank';
import { requireFormBodies } from '../../src/lib/server/hooks/form-bodies';
import { text } from '../../src/lib/schemas/text';
import { Project, Route } from '../../src/lib/server/db';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let projectId = '';
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	projectId = (await makeProject(f.team.id, 'Control project')).id;
});

async function call(handler: unknown, body: unknown, params: Record<string, string> = {}) {
	const event = fakeEvent({
		user: f.people.chemist,
		path: '/api/x',
		method: 'POST',
		body
	}) as RequestEvent;
	Object.assign(event, { params });
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

describe('control characters in text fields', () => {
	it('refuses NUL and other C0 controls but keeps tabs and line breaks (molfiles need them)', () => {
		for (const bad of ['a\u0000b', 'a\u0007', '\u001b[31m', 'x\u007f']) {
			expect(text().safeParse(bad).success, JSON.stringify(bad)).toBe(false);
		}
		expect(text().safeParse('line one\r\n\tline two').success).toBe(true);
	});

	it('answers 400 with a message for a project name with NUL, and stores nothing', async () => {
		const before = await Project.count();
		const answer = await call(createProject, { name: 'Kitti\u0000wake', teamId: f.team.id });
		expect(answer.status).toBe(400);
		expect(JSON.stringify(answer.body.error.details)).toMatch(/control characters/);
		expect(await Project.count()).toBe(before);
	});

	it('answers 422 naming the field for a route whose step notes hold a NUL', async () => {
		const doc = {
			name: 'Route',
			intermediates: [
				{ id: 'a', structure: 'CCO' },
				{ id: 'b', structure: 'CC=O' }
			],
			steps: [{ id: 's1', from: ['a'], to: 'b', notes: 'see p. 4\u0000' }]
		};
		const answer = await call(createRoute, doc, { projectId });
		expect(answer.status).toBe(422);
		expect(answer.body.error.message).toMatch(/control characters.*steps\.0\.notes/);
		expect(await Route.count()).toBe(0);
	});
});

describe('form bodies on pages', () => {
	const post = (contentType: string | null, body: BodyInit) => {
		const url = new URL('http://localhost/projects?/create');
		const headers = contentType ? { 'content-type': contentType } : undefined;
		const request = new Request(url, { method: 'POST', headers, body });
		let resolved = false;
		const answer = requireFormBodies({
			event: { url, request } as RequestEvent,
			resolve: async () => {
				resolved = true;
				return new Response('ok');
			}
		}) as Promise<Response>;
		return answer.then(async (response) => ({
			status: response.status,
			text: await response.text(),
			resolved
		}));
	};

	it('refuses text/plain and JSON with 415 and a sentence, before any action runs', async () => {
		for (const type of ['text/plain', 'application/json']) {
			const answer = await post(type, 'name=x');
			expect(answer).toEqual({
				status: 415,
				text: expect.stringContaining('Forms send'),
				resolved: false
			});
		}
	});

	it('refuses a malformed multipart body with 400', async () => {
		const answer = await post('multipart/form-data; boundary=zzz', 'not multipart at all');
		expect(answer).toMatchObject({ status: 400, resolved: false });
	});

	it('lets real forms through', async () => {
		expect((await post('application/x-www-form-urlencoded', 'name=Kittiwake')).resolved).toBe(true);
		const form = new FormData();
		form.set('name', 'Kittiwake');
		expect((await post(null, form)).resolved).toBe(true);
	});
});

describe('id matchers', () => {
	it('takes UUIDs and plan ranks only', () => {
		expect(isUuid('7d3f1c2e-8a4b-4c6d-9e0f-112233445566')).toBe(true);
		for (const bad of ['1', 'abc', "' or 1=1 --", '7d3f1c2e-8a4b-4c6d-9e0f-1122334455667']) {
			expect(isUuid(bad)).toBe(false);
		}
		expect(['1', '2', '12'].map(isRank)).toEqual([true, true, true]);
		expect(['0', 'first', '1e9', '-1', '01'].map(isRank)).toEqual([
			false,
			false,
			false,
			false,
			false
		]);
	});

	it('guards every id segment in the route tree with the uuid matcher (a non-uuid id is a 404 on every dialect)', () => {
		const unguarded: string[] = [];
		const walk = (dir: string) => {
			for (const name of readdirSync(dir)) {
				const path = join(dir, name);
				if (!statSync(path).isDirectory()) {
					continue;
				}
				if (/^\[\w+Id\]$/.test(name)) {
					unguarded.push(path);
				}
				walk(path);
			}
		};
		walk('src/routes');
		expect(unguarded).toEqual([]);
	});
});
