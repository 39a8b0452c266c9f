// Structures are checked against the limits when a route is created, saved or imported, not only
// when it is opened (issue 10, defect 1: a stored killer molfile took down whoever opened it).
// Over a limit → 422 naming the intermediate, nothing stored; merely unreadable drafts are kept.

import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import { Intermediate, Route, type Project } from '../../src/lib/server/db';
import { STRUCTURE_LIMITS } from '../../src/lib/chem/limits';
import { closeChemistryPool } from '../../src/lib/server/chem-pool/pool';
import { uploadRouteFile } from '../factories/route-upload';
import { callApi, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

const killer = readFileSync(
	new URL('../fixtures/declares-99999999-atoms-v3000.mol', import.meta.url),
	'utf8'
);

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;

const route = (structures: string[], name = 'Limits route') => ({
	name,
	intermediates: structures.map((structure, i) => ({
		id: `n${i + 1}`,
		label: `OG-LIM-${i + 1}`,
		structure
	})),
	steps: structures
		.slice(1)
		.map((_, i) => ({ id: `s${i + 1}`, from: [`n${i + 1}`], to: `n${i + 2}` }))
});

const call = (handler: unknown, params: Record<string, string>, method: string, body?: unknown) =>
	callApi(handler, { user: f.people.chemist, method, body, params });

async function upload(name: string, text: string) {
	return (await uploadRouteFile({ user: f.people.chemist, projectId: project.id, name, text })) as {
		status: number;
		body: { error: { code: string; message: string } };
	};
}

const counts = async () => [await Route.count(), await Intermediate.count()];

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Limits project');
});
afterAll(() => closeChemistryPool());

describe('route create, save and import check structure limits', () => {
	it('creating a route with the killer molfile → 422 structure_too_large naming the intermediate; nothing stored', async () => {
		const before = await counts();
		const { status, body } = await call(
			routeList.POST,
			{ projectId: project.id },
			'POST',
			route(['CCO', killer])
		);
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'structure_too_large',
			message: expect.stringMatching(/^Intermediate “OG-LIM-2” is too large: .*99,999,999 atoms/),
			details: { intermediate: 'n2', limit: { name: 'maxAtoms', found: 99_999_999 } }
		});
		expect(await counts()).toEqual(before);
	});
	it('saving the killer molfile over a stored route → 422, the stored version untouched', async () => {
		const created = await call(
			routeList.POST,
			{ projectId: project.id },
			'POST',
			route(['CCO', 'CC=O'])
		);
		expect(created.status).toBe(201);
		const routeId = created.body.id;
		const saved = await call(oneRoute.PUT, { routeId }, 'PUT', {
			version: 1,
			document: route(['CCO', killer])
		});
		expect(saved.status).toBe(422);
		expect(saved.body.error.code).toBe('structure_too_large');
		const stored = await call(oneRoute.GET, { routeId }, 'GET');
		expect(stored.body.version).toBe(1);
		expect(stored.body.document.intermediates[1].structure).toBe('CC=O');
	});
	it('a 10,000-atom SMILES is refused at save too; an unreadable draft is kept for the check to report', async () => {
		const big = await call(
			routeList.POST,
			{ projectId: project.id },
			'POST',
			route(['CCO', 'C'.repeat(10_000)])
		);
		expect(big.status).toBe(422);
		expect(big.body.error.code).toBe('structure_too_large');
		// The chemist is still drawing: an unclosed ring is stored, as before.
		const draft = await call(
			routeList.POST,
			{ projectId: project.id },
			'POST',
			route(['CCO', 'C1CC'])
		);
		expect(draft.status).toBe(201);
	});
	it('a route whose intermediates together pass the route limit → 422 route_too_large', async () => {
		const perNode = STRUCTURE_LIMITS.maxHeavyAtoms;
		const nodes = Math.floor(STRUCTURE_LIMITS.maxRouteHeavyAtoms / perNode) + 1;
		const structures = Array.from({ length: nodes }, () => 'C'.repeat(perNode));
		const { status, body } = await call(
			routeList.POST,
			{ projectId: project.id },
			'POST',
			route(structures)
		);
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'route_too_large',
			details: { limit: { name: 'maxRouteHeavyAtoms' } }
		});
	});
	it('importing an SDF or a route JSON holding the killer molfile → 422 naming the record; nothing stored', async () => {
		const before = await counts();
		const sdf = `${killer}$$$$\n`;
		const fromSdf = await upload('killer.sdf', sdf);
		expect(fromSdf.status).toBe(422);
		expect(fromSdf.body.error).toMatchObject({
			code: 'structure_too_large',
			message: expect.stringMatching(/^Record 1 /),
			details: { record: 1 }
		});
		const fromJson = await upload('killer.json', JSON.stringify(route(['CCO', killer])));
		expect(fromJson.status).toBe(422);
		expect(fromJson.body.error).toMatchObject({
			code: 'structure_too_large',
			details: { record: 2 }
		});
		expect(await counts()).toEqual(before);
	});
});
