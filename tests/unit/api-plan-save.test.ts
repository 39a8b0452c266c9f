import type { RequestEvent } from '@sveltejs/kit';
import { existsSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { match as matchRank } from '../../src/params/rank';
import { POST as savePlan } from '../../src/routes/api/routes/[routeId=uuid]/plan/[rank=rank]/save/+server';
import { POST as createOne } from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import { GET as getRoute } from '../../src/routes/api/routes/[routeId=uuid]/+server';
import { load } from '../../src/routes/routes/[routeId=uuid]/+page.server';
import { ActivityEvent, PlannedRoute, Route, type Project } from '../../src/lib/server/db';
import {
	createRoute,
	plannedRouteName,
	routeDocumentAt,
	routeLinks,
	saveRoute,
	VersionConflict
} from '../../src/lib/server/services/routes';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { line } from '../factories/plan-routes';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
type Who = keyof typeof f.people;

async function call(
	handler: unknown,
	who: Who | null,
	params: Record<string, string>,
	body?: unknown
) {
	const event = fakeEvent({
		user: who ? f.people[who] : null,
		path: '/api/x',
		method: 'POST',
		body
	}) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = params;
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

// The Cormorant keto ester meets a Grignard reagent while its ketone stands by, so the ketone
// must be masked (Clayden, ketones react with Grignard reagents; from memory).
const grignard = () =>
	line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['MeMgBr, THF'], 'OG-2031 Grignard');
// Here the ketone reacts on purpose and the methyl ester must stand by a Grignard reagent: no PG
// masks an ester, so there is no plan (Clayden, esters react with Grignard reagents; from memory).
const hopeless = () =>
	line(['CC(=O)CCC(=O)OC', 'CC(O)(C)CCC(=O)OC'], ['MeMgBr, THF'], 'OG-2031 ester kept');

async function storedRoute(doc = grignard()): Promise<string> {
	const created = await call(createOne, 'chemist', { projectId: project.id }, doc);
	expect(created.status).toBe(201);
	return created.body.id;
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Cormorant');
});

describe('POST /api/routes/{id}/plan/{rank}/save', () => {
	it('saves the planner’s own plan 1 as a new linked route for a chemist, and records it', async () => {
		const routeId = await storedRoute();
		const saved = await call(savePlan, 'chemist', { routeId, rank: '1' }, { version: 1 });
		expect(saved.status).toBe(201);
		expect(saved.body).toEqual({
			id: expect.any(String),
			version: 1,
			name: 'OG-2031 Grignard (protected, plan 1)'
		});

		// What was stored is exactly the planner's document for that rank, under the new name.
		const expected = planRouteDocument(grignard()).plans[0]!.route;
		const got = await call(getRoute, 'viewer', { routeId: saved.body.id });
		expect(got.body.document).toEqual({
			...expected,
			name: 'OG-2031 Grignard (protected, plan 1)'
		});
		expect(got.body.projectId).toBe(project.id);
		expect(
			got.body.document.steps.map((s: { intent?: string }) => s.intent ?? 'transform')
		).toEqual(['protect', 'transform', 'deprotect']);

		expect(
			await PlannedRoute.findOne({ where: { routeId: saved.body.id }, raw: true })
		).toMatchObject({ plannedFromId: routeId, rank: 1 });
		const event = await ActivityEvent.findOne({
			where: { kind: 'route.planned' },
			order: [['createdAt', 'DESC']]
		});
		expect(event?.summary).toBe(
			'Chemist saved plan 1 for “OG-2031 Grignard” as the route “OG-2031 Grignard (protected, plan 1)”.'
		);
		expect(event?.details).toEqual({ routeId: saved.body.id, plannedFromId: routeId, rank: 1 });
		expect(event?.projectId).toBe(project.id);

		// The original is untouched: same version, same two intermediates.
		const original = await call(getRoute, 'chemist', { routeId });
		expect(original.body.version).toBe(1);
		expect(original.body.document).toEqual(grignard());
	});

	it('saves a lower-ranked plan for a lead, as that plan and not the first', async () => {
		const routeId = await storedRoute();
		const plans = planRouteDocument(grignard()).plans;
		expect(plans.length).toBeGreaterThan(1);
		const saved = await call(savePlan, 'lead', { routeId, rank: '2' }, { version: 1 });
		expect(saved.status).toBe(201);
		const got = await call(getRoute, 'lead', { routeId: saved.body.id });
		expect(got.body.document).toEqual({
			...plans[1]!.route,
			name: 'OG-2031 Grignard (protected, plan 2)'
		});
	});

	it('refuses reviewers and viewers (403), other teams and unknown routes (404), and visitors (401), saving nothing', async () => {
		const routeId = await storedRoute();
		const before = await Route.count();
		for (const who of ['reviewer', 'viewer'] as const) {
			const refused = await call(savePlan, who, { routeId, rank: '1' }, { version: 1 });
			expect(refused.status, who).toBe(403);
			expect(refused.body.error.code).toBe('forbidden');
		}
		expect((await call(savePlan, 'outsider', { routeId, rank: '1' }, { version: 1 })).status).toBe(
			404
		);
		const unknown = { routeId: '00000000-0000-4000-8000-000000000000', rank: '1' };
		expect((await call(savePlan, 'lead', unknown, { version: 1 })).status).toBe(404);
		expect((await call(savePlan, null, { routeId, rank: '1' }, { version: 1 })).status).toBe(401);
		expect(await Route.count()).toBe(before);
	});

	it('answers 409 when the route changed since the plans were shown, 400 without a version, 404 for a rank it has not got', async () => {
		const routeId = await storedRoute();
		const stale = await call(savePlan, 'chemist', { routeId, rank: '1' }, { version: 7 });
		expect(stale.status).toBe(409);
		expect(stale.body.error).toMatchObject({
			code: 'version_conflict',
			details: { currentVersion: 1 }
		});
		expect((await call(savePlan, 'chemist', { routeId, rank: '1' }, {})).body.error.code).toBe(
			'invalid_body'
		);
		const missing = await call(savePlan, 'chemist', { routeId, rank: '9' }, { version: 1 });
		expect(missing.status).toBe(404);
		expect(missing.body.error.code).toBe('no_such_plan');
	});

	// Issue 10, defect 11: a rank that cannot name a plan is refused before any planning. The
	// `rank` matcher does it in the router, so the handler never sees such a rank (issue 13: no
	// hand check in the handler); the router then answers the `/api` fallback's 404.
	it('leaves ranks that cannot name a plan to the router: the save route is guarded by the rank matcher', () => {
		expect(
			existsSync('src/routes/api/routes/[routeId=uuid]/plan/[rank=rank]/save/+server.ts')
		).toBe(true);
		for (const rank of ['0', 'first', '1e3', '1e9', '-1', '01', '1.5', '']) {
			expect(matchRank(rank), rank).toBe(false);
		}
		expect(['1', '2', '12'].map(matchRank)).toEqual([true, true, true]);
	});
	it('says why when the route has no plan at all', async () => {
		const routeId = await storedRoute(hopeless());
		const answer = await call(savePlan, 'chemist', { routeId, rank: '1' }, { version: 1 });
		expect(answer.status).toBe(404);
		expect(answer.body.error.message).toMatch(/^There is no plan 1 for this route\. .*step "s1"/);
	});

	it('answers 422 naming the problem when the stored route is not a valid route document', async () => {
		// The service stores what it is given; a half-drawn route can point at a missing intermediate.
		const broken = await createRoute(f.people.chemist, project, {
			...grignard(),
			steps: [{ id: 's1', from: ['i0'], to: 'gone' }]
		});
		const answer = await call(
			savePlan,
			'chemist',
			{ routeId: broken.id, rank: '1' },
			{ version: 1 }
		);
		expect(answer.status).toBe(422);
		expect(answer.body.error).toMatchObject({
			code: 'invalid_route',
			message: expect.stringContaining('unknown intermediate "gone"')
		});
	});
});

describe('links between a route and its saved plans', () => {
	it('name the original on the planned route and list the planned versions on the original, on the page too', async () => {
		const routeId = await storedRoute();
		const first = await call(savePlan, 'chemist', { routeId, rank: '1' }, { version: 1 });
		const second = await call(savePlan, 'lead', { routeId, rank: '2' }, { version: 1 });
		const original = (await Route.findByPk(routeId))!;
		expect(await routeLinks(original)).toEqual({
			plannedFrom: null,
			plannedVersions: [
				{ id: first.body.id, name: 'OG-2031 Grignard (protected, plan 1)', rank: 1 },
				{ id: second.body.id, name: 'OG-2031 Grignard (protected, plan 2)', rank: 2 }
			]
		});
		const event = fakeEvent({
			user: f.people.viewer,
			path: `/routes/${first.body.id}`
		}) as RequestEvent & { params: Record<string, string> };
		event.params = { routeId: first.body.id };
		const data = (await (load as unknown as (e: RequestEvent) => Promise<Record<string, unknown>>)(
			event
		)) as { links: unknown };
		expect(data.links).toEqual({
			plannedFrom: { id: routeId, name: 'OG-2031 Grignard', rank: 1 },
			plannedVersions: []
		});
	});

	it('keep the planned route when the original goes (the link is cleared)', async () => {
		const routeId = await storedRoute();
		const saved = await call(savePlan, 'chemist', { routeId, rank: '1' }, { version: 1 });
		await Route.destroy({ where: { id: routeId } });
		const planned = (await Route.findByPk(saved.body.id))!;
		expect(planned).not.toBeNull();
		expect(await routeLinks(planned)).toEqual({ plannedFrom: null, plannedVersions: [] });
		expect(await PlannedRoute.findOne({ where: { routeId: planned.id }, raw: true })).toMatchObject(
			{ plannedFromId: null, rank: 1 }
		);
	});
});

describe('plannedRouteName', () => {
	it('adds the plan to the name and keeps it within 120 characters', () => {
		expect(plannedRouteName('OG-2031 Grignard', 3)).toBe('OG-2031 Grignard (protected, plan 3)');
		const long = plannedRouteName('OG-2031 '.repeat(20).slice(0, 120), 1);
		expect(long).toHaveLength(120);
		expect(long.endsWith(' (protected, plan 1)')).toBe(true);
	});
});

describe('reading a stored route at the version the plans were made for', () => {
	it('refuses when a save lands after the route was loaded, even if the children read new', async () => {
		const routeId = await storedRoute();
		const stale = (await Route.findByPk(routeId))!;
		expect((await routeDocumentAt(stale, 1)).steps.map((s) => s.reagents)).toEqual(['MeMgBr, THF']);
		await saveRoute(
			f.people.chemist,
			(await Route.findByPk(routeId))!,
			1,
			line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['EtMgBr, THF']),
			f.team.id
		);
		// The loaded instance still says version 1; the version read after the children does not.
		await expect(routeDocumentAt(stale, 1)).rejects.toBeInstanceOf(VersionConflict);
	});
});
