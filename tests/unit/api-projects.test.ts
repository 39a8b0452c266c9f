import { beforeAll, describe, expect, it } from 'vitest';
import { GET, POST } from '../../src/routes/api/projects/+server';
import { fallback } from '../../src/routes/api/[...rest]/+server';
import { Project } from '../../src/lib/server/db';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	await makeProject(f.team.id, 'Ours');
	await makeProject(f.other.id, 'Theirs');
});

type Handler = (event: never) => Promise<Response> | Response;
const call = async (handler: unknown, options: Parameters<typeof fakeEvent>[0]) => {
	const response = await (handler as Handler)(
		fakeEvent({ path: '/api/projects', ...options }) as never
	);
	return { status: response.status, body: await response.json() };
};

describe('GET /api/projects', () => {
	it('lists only the caller’s teams, in the documented shape', async () => {
		const { status, body } = await call(GET, { user: f.people.viewer });
		expect(status).toBe(200);
		expect(body).toEqual({
			projects: [
				{ id: expect.any(String), name: 'Ours', teamId: f.team.id, teamName: 'Bench team' }
			]
		});
		const outsider = await call(GET, { user: f.people.outsider });
		expect(outsider.body.projects.map((p: { name: string }) => p.name)).toEqual(['Theirs']);
	});
	it('answers 401 in the error shape without a user', async () => {
		expect(await call(GET, {})).toEqual({
			status: 401,
			body: { error: { code: 'unauthenticated', message: expect.any(String) } }
		});
	});
});

describe('POST /api/projects', () => {
	it('creates a project for a chemist and answers 201 { id }', async () => {
		const { status, body } = await call(POST, {
			user: f.people.chemist,
			method: 'POST',
			body: { name: 'Kittiwake', teamId: f.team.id, description: 'A fictional target.' }
		});
		expect(status).toBe(201);
		expect(Object.keys(body)).toEqual(['id']);
		const created = await Project.findByPk(body.id);
		expect(created).toMatchObject({
			name: 'Kittiwake',
			description: 'A fictional target.',
			teamId: f.team.id
		});
	});
	it('refuses a reviewer with 403 and another team with 404', async () => {
		const reviewer = await call(POST, {
			user: f.people.reviewer,
			method: 'POST',
			body: { name: 'Nope', teamId: f.team.id }
		});
		expect(reviewer.status).toBe(403);
		expect(reviewer.body.error.code).toBe('forbidden');
		const outsider = await call(POST, {
			user: f.people.outsider,
			method: 'POST',
			body: { name: 'Nope', teamId: f.team.id }
		});
		expect(outsider.status).toBe(404);
	});
	it('answers 400 with details for a bad body and for non-JSON', async () => {
		const bad = await call(POST, {
			user: f.people.lead,
			method: 'POST',
			body: { name: '', teamId: 'x' }
		});
		expect(bad.status).toBe(400);
		expect(bad.body.error.code).toBe('invalid_body');
		expect(bad.body.error.details.map((d: { path: string[] }) => d.path[0]).sort()).toEqual([
			'name',
			'teamId'
		]);
		const garbage = await call(POST, { user: f.people.lead, method: 'POST', body: 'not json' });
		expect(garbage.status).toBe(400);
	});
	it('answers 413 for a body over 2 MB', async () => {
		const huge = { name: 'Big', teamId: f.team.id, description: 'x'.repeat(2.5 * 1024 * 1024) };
		const { status, body } = await call(POST, { user: f.people.lead, method: 'POST', body: huge });
		expect(status).toBe(413);
		expect(body.error.code).toBe('too_large');
	});
});

describe('unknown API paths', () => {
	it('answer 404 in the error shape', async () => {
		const { status, body } = await call(fallback, {
			user: f.people.lead,
			path: '/api/nothing-here'
		});
		expect(status).toBe(404);
		expect(body.error.code).toBe('not_found');
	});
});
