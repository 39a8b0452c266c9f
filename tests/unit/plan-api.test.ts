import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as planPost } from '../../src/routes/api/plan/+server';
import { POST as routePlan } from '../../src/routes/api/routes/[routeId=uuid]/plan/+server';
import { POST as createRoute } from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { line } from '../factories/plan-routes';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

type Who = keyof typeof f.people;
async function call(
	handler: unknown,
	who: Who | null,
	options: { params?: Record<string, string>; body?: unknown } = {}
) {
	const event = fakeEvent({
		user: who ? f.people[who] : null,
		path: '/api/plan',
		method: 'POST',
		body: options.body
	}) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = options.params ?? {};
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

// A ketone standing by while a Grignard reagent adds to an ester (Clayden, from memory).
const grignard = line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['MeMgBr, THF'], 'OG-2031 Grignard');

describe('POST /api/plan', () => {
	it('answers ranked plans in the documented shape', async () => {
		const { status, body } = await call(planPost, 'viewer', { body: grignard });
		expect(status).toBe(200);
		expect(body.unsolved).toBeUndefined();
		const [plan] = body.plans;
		// The fields, plus what the plan asks of the people who run it.
		expect(Object.keys(plan).sort()).toEqual([
			'addedSteps',
			'cautions',
			'hazards',
			'protections',
			'rank',
			'rationale',
			'route',
			'score',
			'unrecognized'
		]);
		// Every reagent of the route and of the steps the plan adds is known.
		expect(plan.unrecognized).toEqual([]);
		expect(Object.keys(plan.protections[0]).sort()).toEqual([
			'atoms',
			'group',
			'install',
			'intermediate',
			'protectingGroup',
			'removal'
		]);
		expect(plan.protections[0]).toMatchObject({
			group: 'ketone',
			install: { before: 's1' },
			removal: { after: 'end' }
		});
		expect(plan.route.steps.map((s: { intent?: string }) => s.intent ?? 'transform')).toEqual([
			'protect',
			'transform',
			'deprotect'
		]);
	});

	it('lists the hazards of the reagents a plan adds, each deferring to the SDS — rules/reagents.json hazard notes', async () => {
		const { body } = await call(planPost, 'viewer', { body: grignard });
		const added = new Set(
			body.plans[0].route.steps
				.filter((s: { intent?: string }) => s.intent)
				.map((s: { id: string }) => s.id)
		);
		expect(body.plans[0].hazards.length).toBeGreaterThan(0);
		for (const hazard of body.plans[0].hazards) {
			expect(added.has(hazard.step)).toBe(true);
			expect(hazard.note).toMatch(/SDS/);
		}
		// The Grignard step is the chemist's own: its hazards are not the plan's to list.
		expect(body.plans[0].hazards.map((h: { reagent: string }) => h.reagent)).not.toContain(
			'MeMgBr'
		);
	});

	it('names the reagent text its re-check did not recognise, on the step the plan passes through', async () => {
		// A house additive code beside the Grignard: the plan cannot say what it does, and says so.
		const withAdditive = line(
			['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'],
			['MeMgBr, OG-Cat 17, THF'],
			'OG-2031 additive'
		);
		const { status, body } = await call(planPost, 'viewer', { body: withAdditive });
		expect(status).toBe(200);
		expect(body.plans.length).toBeGreaterThan(0);
		for (const plan of body.plans) {
			expect(plan.unrecognized).toEqual([{ step: 's1', text: ['OG-Cat 17'] }]);
		}
	});

	it('answers 422 for a bad route document and 401 without a user', async () => {
		const dangling = { ...grignard, steps: [{ id: 's1', from: ['i0'], to: 'nowhere' }] };
		const bad = await call(planPost, 'lead', { body: dangling });
		expect(bad.status).toBe(422);
		expect(bad.body.error.code).toBe('invalid_route');
		expect((await call(planPost, 'lead', { body: { name: '' } })).status).toBe(422);
		expect((await call(planPost, null, { body: grignard })).status).toBe(401);
	});
});

describe('POST /api/routes/{id}/plan', () => {
	it('plans a stored route for anyone who may read it; 404 for outsiders, 401 without a user', async () => {
		const project = await makeProject(f.team.id);
		const created = await call(createRoute, 'chemist', {
			params: { projectId: project.id },
			body: grignard
		});
		expect(created.status).toBe(201);
		const params = { routeId: created.body.id };
		const { status, body } = await call(routePlan, 'viewer', { params });
		expect(status).toBe(200);
		expect(body.plans[0].protections[0].group).toBe('ketone');
		expect((await call(routePlan, 'outsider', { params })).status).toBe(404);
		expect((await call(routePlan, null, { params })).status).toBe(401);
		expect(
			(
				await call(routePlan, 'lead', {
					params: { routeId: '00000000-0000-0000-0000-000000000000' }
				})
			).status
		).toBe(404);
	});
});
