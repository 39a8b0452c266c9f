import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import * as exportRoute from '../../src/routes/api/routes/[routeId=uuid]/export/+server';
import { ActivityEvent, Intermediate } from '../../src/lib/server/db';
import type { Project } from '../../src/lib/server/db';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;

const doc = (name = 'Route one', extra = 0) => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC', position: { x: 10, y: 20 } },
		{ id: 'b', label: 'protected', structure: 'CC1(CCC(=O)OC)OCCO1' },
		...Array.from({ length: extra }, (_, i) => ({ id: `extra-${i}`, structure: 'C' }))
	],
	steps: [
		{
			id: 's1',
			from: ['a'],
			to: 'b',
			reagents: 'ethylene glycol, TsOH, toluene, reflux',
			intent: 'protect' as const
		}
	]
});

type Who = keyof typeof f.people;
async function call(
	handler: unknown,
	who: Who | null,
	params: Record<string, string>,
	method = 'GET',
	body?: unknown
) {
	const event = fakeEvent({
		user: who ? f.people[who] : null,
		path: '/api/x',
		method,
		body
	}) as RequestEvent & { params: Record<string, string> };
	event.params = params;
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Routes project');
});

describe('route API', () => {
	let routeId = '';

	it('creates a route for a chemist (201 { id, version }) and lists it for every role', async () => {
		const created = await call(routeList.POST, 'chemist', { projectId: project.id }, 'POST', doc());
		expect(created.status).toBe(201);
		expect(created.body).toEqual({ id: expect.any(String), version: 1 });
		routeId = created.body.id;
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			const listed = await call(routeList.GET, who, { projectId: project.id });
			expect(listed.body.routes).toEqual([
				{
					id: routeId,
					name: 'Route one',
					status: 'draft',
					version: 1,
					updatedAt: expect.any(String)
				}
			]);
		}
		expect(await ActivityEvent.count({ where: { kind: 'route.created' } })).toBe(1);
	});

	it('round-trips the route document through GET', async () => {
		const got = await call(oneRoute.GET, 'viewer', { routeId });
		expect(got.status).toBe(200);
		expect(got.body).toEqual({
			id: routeId,
			projectId: project.id,
			name: 'Route one',
			status: 'draft',
			version: 1,
			document: doc()
		});
	});

	it('saves with the current version and refuses a stale one with 409, writing nothing', async () => {
		const saved = await call(oneRoute.PUT, 'lead', { routeId }, 'PUT', {
			version: 1,
			document: doc('Route one, revised', 2)
		});
		expect(saved).toEqual({ status: 200, body: { version: 2 } });
		const stale = await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
			version: 1,
			document: doc('Lost edit')
		});
		expect(stale.status).toBe(409);
		expect(stale.body.error.code).toBe('version_conflict');
		const got = await call(oneRoute.GET, 'chemist', { routeId });
		expect(got.body.name).toBe('Route one, revised');
		expect(got.body.version).toBe(2);
		expect(await Intermediate.count({ where: { routeId } })).toBe(4);
	});

	it('keeps a step’s quantities and trap log through a save, the GET and the JSON export', async () => {
		const withQuantities = doc('Route one, weighed');
		const step = {
			...withQuantities.steps[0]!,
			quantities: [
				{ name: 'keto ester', role: 'limiting' as const, structure: 'a', mass: 20 },
				{ name: 'ethylene glycol', role: 'reagent' as const, volume: 12 },
				{ name: 'toluene', role: 'solvent' as const, volume: 75 }
			],
			waterRemoval: {
				solvent: 'toluene',
				trapCapacity: 10,
				log: [
					{ minutes: 0, volume: 0 },
					{ minutes: 60, volume: 2.1 }
				]
			}
		};
		const document = { ...withQuantities, steps: [step] };
		const got0 = await call(oneRoute.GET, 'lead', { routeId });
		const saved = await call(oneRoute.PUT, 'lead', { routeId }, 'PUT', {
			version: got0.body.version,
			document
		});
		expect(saved.status).toBe(200);
		const got = await call(oneRoute.GET, 'viewer', { routeId });
		expect(got.body.document.steps[0]).toEqual(step);
		const exported = await call(exportRoute.GET, 'viewer', { routeId });
		expect(JSON.stringify(exported.body)).toContain('"trapCapacity":10');
		expect(JSON.stringify(exported.body)).toContain('"name":"ethylene glycol"');
	});

	it('refuses reviewers and viewers with 403 and other teams with 404, on every endpoint', async () => {
		for (const who of ['reviewer', 'viewer'] as const) {
			expect(
				(await call(routeList.POST, who, { projectId: project.id }, 'POST', doc())).status
			).toBe(403);
			expect(
				(await call(oneRoute.PUT, who, { routeId }, 'PUT', { version: 2, document: doc() })).status
			).toBe(403);
		}
		expect((await call(routeList.GET, 'outsider', { projectId: project.id })).status).toBe(404);
		expect(
			(await call(routeList.POST, 'outsider', { projectId: project.id }, 'POST', doc())).status
		).toBe(404);
		expect((await call(oneRoute.GET, 'outsider', { routeId })).status).toBe(404);
		expect(
			(await call(oneRoute.PUT, 'outsider', { routeId }, 'PUT', { version: 2, document: doc() }))
				.status
		).toBe(404);
		expect((await call(oneRoute.GET, null, { routeId })).status).toBe(401);
	});

	it('answers 422 naming the problem for an invalid document', async () => {
		const cyclic = { ...doc(), steps: [...doc().steps, { id: 's2', from: ['b'], to: 'a' }] };
		const bad = await call(routeList.POST, 'chemist', { projectId: project.id }, 'POST', cyclic);
		expect(bad.status).toBe(422);
		expect(bad.body.error).toMatchObject({
			code: 'invalid_route',
			message: 'The steps form a cycle: a → b → a. (at steps)'
		});
	});
});
