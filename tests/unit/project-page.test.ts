import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { load } from '../../src/routes/projects/[projectId=uuid]/+page.server';
import { GET as listRoutesApi } from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import { Comment, type Project } from '../../src/lib/server/db';
import { createRoute } from '../../src/lib/server/services/routes';
import {
	callApi,
	fakeEvent,
	freshDatabase,
	makeProject,
	makeTeamWithEveryRole
} from '../factories';

// The project's route table: each route's review status and its number of open comments.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
const ids: Record<string, string> = {};
type Row = { id: string; name: string; status: string; openComments: number };

async function rows(who: keyof typeof f.people): Promise<Row[]> {
	const event = fakeEvent({
		user: f.people[who],
		path: `/projects/${project.id}`
	}) as RequestEvent & { params: Record<string, string> };
	event.params = { projectId: project.id };
	const data = (await (load as unknown as (e: RequestEvent) => Promise<{ routes: Row[] }>)(event))!;
	return data.routes;
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Cormorant table test');
	const empty = { intermediates: [], steps: [] };
	for (const name of ['Discussed', 'Quiet']) {
		ids[name] = (await createRoute(f.people.chemist, project, { name, ...empty })).id;
	}
	const comment = (stepKey: string | null, resolved: boolean) =>
		Comment.create({
			routeId: ids.Discussed!,
			stepKey,
			replyToId: null,
			authorId: f.people.reviewer.id,
			body: 'Why TBS here?',
			resolved,
			resolvedById: resolved ? f.people.chemist.id : null,
			editedAt: null
		});
	// Two open (one on a step, one on the route), one resolved: 2 open.
	await comment('s1', false);
	await comment(null, false);
	await comment('s1', true);
});

describe('the project page route table', () => {
	it('gives every route its open (unresolved) comments, 0 for a route without any', async () => {
		for (const who of ['lead', 'viewer'] as const) {
			const byName = Object.fromEntries((await rows(who)).map((r) => [r.name, r.openComments]));
			expect(byName, who).toEqual({ Discussed: 2, Quiet: 0 });
		}
	});

	it('keeps GET /api/projects/{id}/routes to its contract: no open-comment field', async () => {
		const { status, body } = await callApi(listRoutesApi, {
			user: f.people.viewer,
			method: 'GET',
			params: { projectId: project.id }
		});
		expect(status).toBe(200);
		for (const route of body.routes) {
			expect(Object.keys(route).sort()).toEqual(['id', 'name', 'status', 'updatedAt', 'version']);
		}
	});
});
