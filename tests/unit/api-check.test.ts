import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as checkPost } from '../../src/routes/api/check/+server';
import { GET as routeCheck } from '../../src/routes/api/routes/[routeId=uuid]/check/+server';
import { POST as createRoute } from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

type Who = keyof typeof f.people;
async function call(
	handler: unknown,
	who: Who | null,
	options: { params?: Record<string, string>; method?: string; body?: unknown } = {}
) {
	const event = fakeEvent({
		user: who ? f.people[who] : null,
		path: '/api/check',
		method: options.method ?? 'POST',
		body: options.body
	}) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = options.params ?? {};
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

// A ketone standing by while a Grignard reagent adds to the ester (Clayden, from memory).
const grignard = {
	id: 'add-MeMgBr',
	substrate: 'CC(=O)CCC(=O)OC',
	product: 'CC(=O)CCC(C)(C)O',
	reagents: 'MeMgBr, THF'
};

describe('POST /api/check', () => {
	it('answers per step with conditions, hazards and clashes in the documented shape', async () => {
		const { status, body } = await call(checkPost, 'viewer', { body: { steps: [grignard] } });
		expect(status).toBe(200);
		expect(body.steps).toHaveLength(1);
		const [step] = body.steps;
		expect(Object.keys(step).sort()).toEqual([
			'clashes',
			'conditions',
			'hazards',
			'id',
			'reagentClasses',
			'unrecognized'
		]);
		// Which reagent brought which class, as typed (THF brings none).
		expect(step.reagentClasses).toEqual([
			{ reagent: 'MeMgBr', text: 'MeMgBr', conditions: ['organometallic-grignard'] },
			{ reagent: 'THF', text: 'THF', conditions: [] }
		]);
		expect(step.id).toBe('add-MeMgBr');
		// Every word of 'MeMgBr, THF' is known: the list is there, and empty.
		expect(step.unrecognized).toEqual([]);
		expect(step.conditions).toContain('organometallic-grignard');
		expect(step.clashes[0]).toEqual({
			severity: 'clash',
			kind: 'attacks-free-group',
			subject: 'ketone',
			condition: 'organometallic-grignard',
			atoms: [0, 1, 2, 3],
			message: expect.stringContaining('ketone')
		});
		expect(step.hazards.every((h: { reagent: string; note: string }) => h.reagent && h.note)).toBe(
			true
		);
	});

	it('lists the reagent text it did not recognise, as typed, beside what it did', async () => {
		// A house catalyst code no reagent table lists, next to a known solvent (a step that would
		// have read clean before, since unknown text was dropped without a word).
		const steps = [
			{ ...grignard, id: 'house-cat', reagents: 'MeMgBr, OG-Cat 17, THF' },
			{ ...grignard, id: 'two-unknown', reagents: 'Zq-ligand 5; CH2Cl2 then OG-Cat 17' }
		];
		const { status, body } = await call(checkPost, 'chemist', { body: { steps } });
		expect(status).toBe(200);
		expect(body.steps[0].unrecognized).toEqual(['OG-Cat 17']);
		expect(body.steps[0].conditions).toContain('organometallic-grignard');
		expect(body.steps[1].unrecognized).toEqual(['Zq-ligand 5', 'OG-Cat 17']);
	});

	it('answers 422 naming the step for an unknown condition or an unreadable structure', async () => {
		const unknown = await call(checkPost, 'lead', {
			body: { steps: [grignard, { ...grignard, id: 'second', conditions: ['moonlight'] }] }
		});
		expect(unknown.status).toBe(422);
		expect(unknown.body.error.code).toBe('unknown_condition');
		expect(unknown.body.error.message).toContain('Step "second"');
		const unreadable = await call(checkPost, 'lead', {
			body: { steps: [{ ...grignard, id: 'broken', substrate: 'C1CC(' }] }
		});
		expect(unreadable.status).toBe(422);
		expect(unreadable.body.error).toMatchObject({
			code: 'invalid_structure',
			message: expect.stringContaining('Step "broken"')
		});
	});

	it('answers 400 for the wrong shape, an empty list or more than 200 steps, and 401 without a user', async () => {
		expect((await call(checkPost, 'lead', { body: { steps: [] } })).status).toBe(400);
		expect(
			(
				await call(checkPost, 'lead', {
					body: { steps: Array.from({ length: 201 }, (_, i) => ({ ...grignard, id: `s${i}` })) }
				})
			).status
		).toBe(400);
		expect((await call(checkPost, 'lead', { body: { steps: [{ id: 'x' }] } })).status).toBe(400);
		expect((await call(checkPost, null, { body: { steps: [grignard] } })).status).toBe(401);
	});
});

describe('GET /api/routes/{id}/check', () => {
	it('checks every step of a stored route, and reports a half-drawn step instead of failing', async () => {
		const project = await makeProject(f.team.id);
		const created = await call(createRoute, 'chemist', {
			params: { projectId: project.id },
			body: {
				name: 'Checked route',
				intermediates: [
					{ id: 'a', structure: grignard.substrate },
					{ id: 'b', structure: grignard.product },
					{ id: 'c', structure: '' },
					{ id: 'd', structure: 'C1CC(' },
					{ id: 'e', structure: 'CCO' }
				],
				steps: [
					{ id: 's1', from: ['a'], to: 'b', reagents: grignard.reagents },
					{ id: 's2', from: ['b'], to: 'c', reagents: 'NaBH4, MeOH' },
					{ id: 's3', from: ['d'], to: 'e', reagents: 'OG-Cat 17, CH2Cl2' }
				]
			}
		});
		expect(created.status).toBe(201);
		const { status, body } = await call(routeCheck, 'reviewer', {
			method: 'GET',
			params: { routeId: created.body.id }
		});
		expect(status).toBe(200);
		expect(body.steps.map((s: { id: string }) => s.id)).toEqual(['s1', 's2', 's3']);
		expect(body.steps[0].clashes.map((c: { subject: string }) => c.subject)).toEqual(['ketone']);
		expect(body.steps[1].error.code).toBe('invalid_structure');
		// Not checked is not clean: the error stays, with the problem and no step id in front of it,
		// and the unrecognised text is still listed (it does not depend on the structures).
		expect(body.steps[1].error.message).toBe('The product cannot be read — it is empty.');
		expect(body.steps[1].unrecognized).toEqual([]);
		expect(body.steps[2]).toMatchObject({ id: 's3', clashes: [], unrecognized: ['OG-Cat 17'] });
		expect(body.steps[2].error).toMatchObject({
			code: 'invalid_structure',
			message: expect.stringContaining('substrate')
		});
		expect(body.steps[0].unrecognized).toEqual([]);
		expect(body.steps[0].error).toBeUndefined();
		expect(
			(await call(routeCheck, 'outsider', { method: 'GET', params: { routeId: created.body.id } }))
				.status
		).toBe(404);
	});
});
