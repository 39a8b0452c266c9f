// Malformed structures thrown at every endpoint that reads structures (issue 10, "what to build":
// a fuzz test). Each answer must be a 2xx or a 4xx/503 in the API error shape with a message:
// never a 500, never a hang (the pool's time budget ends every call). The seed is printed so a
// failure can be replayed: FUZZ_SEED=<n> npx vitest run tests/unit/fuzz-structures.test.ts

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as analyze } from '../../src/routes/api/analyze/+server';
import { POST as check } from '../../src/routes/api/check/+server';
import { POST as plan } from '../../src/routes/api/plan/+server';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import type { Project } from '../../src/lib/server/db';
import { closeChemistryPool } from '../../src/lib/server/chem-pool/pool';
import { uploadRouteFile } from '../factories/route-upload';
import { callApi, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { makeMalformedStructures } from '../factories/malformed-structures';

const SEED = Number(process.env.FUZZ_SEED ?? 20261203);
const CASES = 36;

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
let routeId = '';
let version = 1;

type Answer = { status: number; body: unknown };

const call = (
	handler: unknown,
	method: string,
	body: unknown,
	params: Record<string, string> = {}
): Promise<Answer> => callApi(handler, { user: f.people.chemist, method, body, params });

async function upload(text: string): Promise<Answer> {
	return (await uploadRouteFile({
		user: f.people.chemist,
		projectId: project.id,
		name: 'fuzz.sdf',
		text
	})) as Answer;
}

const routeWith = (structure: string) => ({
	name: 'Fuzz route',
	intermediates: [
		{ id: 'a', structure: 'OCCCC=O' },
		{ id: 'b', structure }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', conditions: ['acid-mild'] }]
});

/** Every endpoint that reads structure text, with the fuzzed text in place. */
const endpoints: Record<string, (text: string) => Promise<Answer>> = {
	analyze: (text) => call(analyze, 'POST', { structure: text, depict: true }),
	check: (text) => call(check, 'POST', { steps: [{ id: 's1', substrate: text, product: 'OCCO' }] }),
	plan: (text) => call(plan, 'POST', routeWith(text)),
	'route create': (text) =>
		call(routeList.POST, 'POST', routeWith(text), { projectId: project.id }),
	'route save': async (text) => {
		const answer = await call(
			oneRoute.PUT,
			'PUT',
			{ version, document: routeWith(text) },
			{ routeId }
		);
		if (answer.status === 200) {
			version = (answer.body as { version: number }).version;
		}
		return answer;
	},
	'SDF import': (text) => upload(text)
};

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Fuzz project');
	const created = await call(routeList.POST, 'POST', routeWith('CCO'), { projectId: project.id });
	routeId = (created.body as { id: string }).id;
});
afterAll(() => closeChemistryPool());

describe(`malformed structures at every endpoint that reads them (seed ${SEED})`, () => {
	const texts = makeMalformedStructures(SEED, CASES);
	for (const [name, send] of Object.entries(endpoints)) {
		it(
			`${name}: never a 500, always a message in the API error shape`,
			{ timeout: 120_000 },
			async () => {
				for (const [index, text] of texts.entries()) {
					const { status, body } = await send(text);
					const where = `case ${index} ${JSON.stringify(text.slice(0, 80))}`;
					expect(status, where).not.toBe(500);
					expect([200, 201, 400, 413, 415, 422, 503], where).toContain(status);
					if (status >= 400) {
						expect(body, where).toMatchObject({
							error: { code: expect.any(String), message: expect.stringMatching(/\w/) }
						});
					}
				}
			}
		);
	}
});
