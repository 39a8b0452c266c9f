import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import * as library from '../../src/routes/api/library/+server';
import * as oneEntry from '../../src/routes/api/library/[conditionId=uuid]/+server';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import type { SavedConditionAnswer } from '../../src/lib/api/answers';
import { Step, type Project } from '../../src/lib/server/db';
import {
	callApi,
	fakeEvent,
	freshDatabase,
	makeProject,
	makeTeamWithEveryRole
} from '../factories';
import { addEntry } from '../factories/library';
import { uploadRouteFile } from '../factories/route-upload';
import * as exportRoute from '../../src/routes/api/routes/[routeId=uuid]/export/+server';

// A step's link to a saved condition (issue 16): the route document's `savedCondition` is stored
// in steps.savedConditionId and read back; another team's entry is refused naming the step; and
// an entry's `uses` is counted from the steps as they are stored now, never kept as a counter.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
let otherProject: Project;

const doc = (name: string, savedCondition?: string) => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'OCCCCO' },
		{ id: 'b', structure: 'CC(C)(C)[Si](C)(C)OCCCCO' }
	],
	steps: [
		{
			id: 's1',
			from: ['a'],
			to: 'b',
			reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2',
			intent: 'protect' as const,
			...(savedCondition ? { savedCondition } : {})
		}
	]
});

const createRoute = (projectId: string, body: unknown, who: 'chemist' | 'outsider' = 'chemist') =>
	callApi(routeList.POST, { user: f.people[who], method: 'POST', body, params: { projectId } });
const saveRoute = (routeId: string, version: number, document: unknown) =>
	callApi(oneRoute.PUT, {
		user: f.people.chemist,
		method: 'PUT',
		body: { version, document },
		params: { routeId }
	});
async function storedDocument(routeId: string) {
	const event = fakeEvent({ user: f.people.viewer, path: `/api/routes/${routeId}` });
	Object.assign(event, { params: { routeId } });
	const response = await (oneRoute.GET as unknown as (e: RequestEvent) => Promise<Response>)(event);
	return (await response.json()).document;
}
async function usesOf(entryId: string): Promise<number> {
	const { body } = await callApi(library.GET, {
		user: f.people.viewer,
		method: 'GET',
		path: `/api/library?teamId=${f.team.id}`
	});
	return (body.conditions as SavedConditionAnswer[]).find((c) => c.id === entryId)!.uses;
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Diol project');
	otherProject = await makeProject(f.other.id, 'Other team project');
});

describe('a step’s saved condition', () => {
	it('is stored with the step and read back in the route document', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id);
		const created = await createRoute(project.id, doc('Linked route', entry.id));
		expect(created.status).toBe(201);
		expect((await storedDocument(created.body.id)).steps[0].savedCondition).toBe(entry.id);
		expect((await Step.findOne({ where: { routeId: created.body.id } }))!.savedConditionId).toBe(
			entry.id
		);
		expect(
			(await storedDocument((await createRoute(project.id, doc('Plain'))).body.id)).steps[0]
		).not.toHaveProperty('savedCondition');
	});

	it('refuses another team’s entry, or none at all, with 422 naming the step; nothing stored', async () => {
		const theirs = await addEntry(f.people.outsider, f.other.id);
		const steps = await Step.count();
		for (const id of [theirs.id, '00000000-0000-4000-8000-000000000000']) {
			const refused = await createRoute(project.id, doc('Borrowed', id));
			expect(refused.status).toBe(422);
			expect(refused.body.error.code).toBe('unknown_saved_condition');
			expect(refused.body.error.message).toContain('“s1”');
			expect(refused.body.error.details).toEqual({ stepId: 's1', savedCondition: id });
		}
		const route = await createRoute(project.id, doc('Saved later'));
		const resaved = await saveRoute(
			route.body.id,
			route.body.version,
			doc('Saved later', theirs.id)
		);
		expect(resaved.status).toBe(422);
		expect(resaved.body.error.details.stepId).toBe('s1');
		expect(await Step.count()).toBe(steps + 1);
		// The entry's own team may name it.
		expect((await createRoute(otherProject.id, doc('Theirs', theirs.id), 'outsider')).status).toBe(
			201
		);
	});

	it('is left out of a JSON export, so the file imports into another team’s project', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id);
		const created = await createRoute(project.id, doc('Exported', entry.id));
		const event = fakeEvent({ user: f.people.viewer, path: '/api/routes/x/export?format=json' });
		Object.assign(event, { params: { routeId: created.body.id } });
		const file = await (
			(await (exportRoute.GET as unknown as (e: RequestEvent) => Promise<Response>)(
				event
			)) as Response
		).text();
		expect(JSON.parse(file).steps[0]).not.toHaveProperty('savedCondition');
		const imported = await uploadRouteFile({
			user: f.people.outsider,
			projectId: otherProject.id,
			name: 'exported.json',
			text: file
		});
		expect(imported.status).toBe(201);
	});
});

describe('uses', () => {
	it('counts the steps that name the entry: two routes → 2; one re-saved without it → 1', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id, { reagents: 'TBSOTf, lutidine' });
		expect(await usesOf(entry.id)).toBe(0);
		const first = await createRoute(project.id, doc('First', entry.id));
		await createRoute(project.id, doc('Second', entry.id));
		expect(await usesOf(entry.id)).toBe(2);
		const resaved = await saveRoute(first.body.id, first.body.version, doc('First'));
		expect(resaved.status).toBe(200);
		expect(await usesOf(entry.id)).toBe(1);
	});

	it('refuses to delete an entry steps follow (409, the count in details); retiring keeps the link', async () => {
		const entry = await addEntry(f.people.chemist, f.team.id, { reagents: 'TBSCl, AgNO3' });
		const route = await createRoute(project.id, doc('Follower', entry.id));
		const event = fakeEvent({ user: f.people.lead, method: 'DELETE' });
		Object.assign(event, { params: { conditionId: entry.id } });
		const refused = await (oneEntry.DELETE as unknown as (e: RequestEvent) => Promise<Response>)(
			event
		);
		expect(refused.status).toBe(409);
		expect((await refused.json()).error).toMatchObject({ code: 'in_use', details: { uses: 1 } });
		await callApi(oneEntry.PATCH, {
			user: f.people.lead,
			method: 'PATCH',
			body: { retired: true },
			params: { conditionId: entry.id }
		});
		// A route that follows a retired entry still saves.
		expect(
			(await saveRoute(route.body.id, route.body.version, doc('Follower', entry.id))).status
		).toBe(200);
		expect(await usesOf(entry.id)).toBe(1);
	});
});
