import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import * as importRoute from '../../src/routes/api/projects/[projectId=uuid]/routes/import/+server';
import * as exportRoute from '../../src/routes/api/routes/[routeId=uuid]/export/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import { Intermediate, Route, type Project } from '../../src/lib/server/db';
import { splitSdf } from '../../src/lib/chem';
import { duplicateRoute, setRouteArchived, listRoutes } from '../../src/lib/server/services/routes';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
type Who = keyof typeof f.people;

const doc = {
	name: 'OG-2031 side chain',
	intermediates: [
		{ id: 'a', label: 'OG-2031-A', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC1(CCC(=O)OC)OCCO1' }
	],
	steps: [
		{ id: 's1', from: ['a'], to: 'b', reagents: 'ethylene glycol, TsOH', conditions: ['acid-mild'] }
	]
};

function withUser(event: RequestEvent, who: Who | null, params: Record<string, string>) {
	event.locals.user = who ? f.people[who] : null;
	event.locals.via = who ? 'session' : null;
	(event as { params: Record<string, string> }).params = params;
	return event;
}

async function upload(
	who: Who | null,
	file: File | string | null,
	extra: Record<string, string> = {}
) {
	const form = new FormData();
	if (file !== null) {
		form.set('file', file);
	}
	for (const [k, v] of Object.entries(extra)) {
		form.set(k, v);
	}
	const request = new Request('http://localhost/api/projects/x/routes/import', {
		method: 'POST',
		body: form
	});
	const event = withUser(
		{ url: new URL(request.url), request, locals: {} } as unknown as RequestEvent,
		who,
		{ projectId: project.id }
	);
	const response = await (importRoute.POST as unknown as (e: RequestEvent) => Promise<Response>)(
		event
	);
	return { status: response.status, body: await response.json() };
}

async function download(who: Who | null, routeId: string, format?: string) {
	const event = withUser(
		fakeEvent({ path: `/api/routes/${routeId}/export${format ? `?format=${format}` : ''}` }),
		who,
		{ routeId }
	);
	const response = await (exportRoute.GET as unknown as (e: RequestEvent) => Promise<Response>)(
		event
	);
	return { status: response.status, headers: response.headers, text: await response.text() };
}

async function stored(routeId: string) {
	const event = withUser(fakeEvent({ path: `/api/routes/${routeId}` }), 'viewer', { routeId });
	return (
		await (await (oneRoute.GET as unknown as (e: RequestEvent) => Promise<Response>)(event)).json()
	).document;
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Cormorant test');
});

describe('route import and export', () => {
	let routeId = '';

	it('imports a route JSON file (201 { id }) and exports it again as JSON and SDF', async () => {
		const created = await upload(
			'chemist',
			new File([JSON.stringify(doc)], 'side-chain.json', { type: 'application/json' })
		);
		expect(created).toEqual({ status: 201, body: { id: expect.any(String) } });
		routeId = created.body.id;
		expect(await stored(routeId)).toEqual(doc);

		const asJson = await download('viewer', routeId, 'json');
		expect(asJson.status).toBe(200);
		expect(asJson.headers.get('content-disposition')).toBe(
			'attachment; filename="OG-2031-side-chain.json"'
		);
		expect(JSON.parse(asJson.text)).toEqual(doc);

		const asSdf = await download('reviewer', routeId, 'sdf');
		expect(asSdf.headers.get('content-type')).toContain('chemical/x-mdl-sdfile');
		expect(splitSdf(asSdf.text).map((r) => r.fields.id)).toEqual(['a', 'b']);
	});

	it('imports the exported SDF back as a new route with the same steps', async () => {
		const sdf = (await download('chemist', routeId, 'sdf')).text;
		const created = await upload('lead', new File([sdf], 'exported.sdf'), {
			name: 'Back from SDF'
		});
		expect(created.status).toBe(201);
		const back = await stored(created.body.id);
		expect(back.name).toBe('Back from SDF');
		expect(back.steps).toEqual(doc.steps);
		expect(back.intermediates.map((n: { id: string; label?: string }) => [n.id, n.label])).toEqual([
			['a', 'OG-2031-A'],
			['b', undefined]
		]);
	});

	it('refuses bad files with a 4xx naming the record and the reason, and writes nothing', async () => {
		const before = await Route.count();
		const nodesBefore = await Intermediate.count();
		const sdf = (await download('chemist', routeId, 'sdf')).text;
		const broken = sdf.replace(/^(.{3}).*V2000$/m, '$1 broken');
		const cases: [File | string | null, number, string, RegExp][] = [
			[null, 400, 'missing_file', /field “file”/],
			['just text', 400, 'missing_file', /field “file”/],
			[new File([''], 'empty.sdf'), 422, 'empty_file', /empty/],
			[new File(['hello there'], 'notes.txt'), 415, 'unsupported_type', /neither an SDF/],
			[new File([broken], 'broken.sdf'), 422, 'invalid_import', /^Record 1 \(“a”\) cannot be read/],
			[new File(['{ "name": '], 'bad.json'), 422, 'invalid_import', /not valid JSON/],
			[
				new File(
					[JSON.stringify({ ...doc, steps: [{ id: 's', from: ['a'], to: 'a' }] })],
					'loop.json'
				),
				422,
				'invalid_import',
				/back to its own/
			],
			[new File(['x'.repeat(5 * 1024 * 1024 + 1)], 'huge.sdf'), 413, 'too_large', /5 MB/]
		];
		for (const [file, status, code, message] of cases) {
			const answer = await upload('chemist', file);
			expect(answer.status, code).toBe(status);
			expect(answer.body.error.code).toBe(code);
			expect(answer.body.error.message).toMatch(message);
		}
		expect(
			(await upload('chemist', new File([broken], 'broken.sdf'))).body.error.details.record
		).toBe(1);
		expect(await Route.count()).toBe(before);
		expect(await Intermediate.count()).toBe(nodesBefore);
	});

	it('answers 415 to a body that is not multipart', async () => {
		const event = withUser(fakeEvent({ path: '/api/x', method: 'POST', body: doc }), 'chemist', {
			projectId: project.id
		});
		const response = await (importRoute.POST as unknown as (e: RequestEvent) => Promise<Response>)(
			event
		);
		expect(response.status).toBe(415);
	});

	it('guards both endpoints: reviewers and viewers cannot import, outsiders see 404, no session 401', async () => {
		const file = () => new File([JSON.stringify(doc)], 'r.json');
		expect((await upload('reviewer', file())).status).toBe(403);
		expect((await upload('viewer', file())).status).toBe(403);
		expect((await upload('outsider', file())).status).toBe(404);
		expect((await upload(null, file())).status).toBe(401);
		expect((await download('outsider', routeId, 'sdf')).status).toBe(404);
		expect((await download(null, routeId, 'sdf')).status).toBe(401);
		const wrong = await download('viewer', routeId, 'cdx');
		expect(wrong.status).toBe(400);
		expect(JSON.parse(wrong.text).error.code).toBe('bad_format');
	});

	it('duplicates a route as a new draft and archives it out of the list', async () => {
		const route = (await Route.findByPk(routeId))!;
		const copy = await duplicateRoute(f.people.chemist, project, route);
		expect(copy.name).toBe('OG-2031 side chain (copy)');
		expect(await stored(copy.id)).toEqual({ ...doc, name: 'OG-2031 side chain (copy)' });
		await setRouteArchived(f.people.chemist, copy, true, f.team.id);
		expect((await listRoutes(project.id)).map((r) => r.id)).not.toContain(copy.id);
		expect(
			(await listRoutes(project.id, { includeArchived: true })).find((r) => r.id === copy.id)
				?.archived
		).toBe(true);
	});
});
