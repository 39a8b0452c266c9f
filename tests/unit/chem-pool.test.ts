// Chemistry runs on a worker pool with limits and a time budget (issue 10, defects 1, 2, 11):
// dangerous structures are refused with a message, an over-budget call answers 503 and the pool
// serves the next one, a full queue answers 503 with retry-after, and a cheap request is not held
// up by chemistry. No timing thresholds: order of completion and answers only.

import { readFileSync } from 'node:fs';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { POST as analyze } from '../../src/routes/api/analyze/+server';
import { GET as rules } from '../../src/routes/api/rules/+server';
import { ApiFailure } from '../../src/lib/server/api';
import { closeChemistryPool, runChemistry } from '../../src/lib/server/chem-pool/pool';
import { STRUCTURE_LIMITS } from '../../src/lib/chem/limits';
import { fakeEvent } from '../factories';
import type { SessionUser } from '../../src/lib/types';

const chemist: SessionUser = {
	id: '00000000-0000-4000-8000-000000000041',
	email: 'pool@lab.example',
	name: 'Pool'
};
const killer = readFileSync(
	new URL('../fixtures/declares-99999999-atoms-v3000.mol', import.meta.url),
	'utf8'
);

type Handler = (event: never) => Promise<Response>;
async function callAnalyze(body: unknown) {
	const response = await (analyze as unknown as Handler)(
		fakeEvent({ user: chemist, path: '/api/analyze', method: 'POST', body }) as never
	);
	return { status: response.status, headers: response.headers, body: await response.json() };
}

/** A peptide-like chain of `units` × 6 heavy atoms: long to perceive, nothing unusual chemically. */
const chain = (units: number) => `N${'C(=O)NC(CO)'.repeat(units)}C(=O)O`;

afterEach(() => {
	delete process.env.ORTHOGON_CHEM_BUDGET_MS;
	delete process.env.ORTHOGON_CHEM_QUEUE;
	delete process.env.ORTHOGON_CHEM_THREADS;
});
afterAll(() => closeChemistryPool());

describe('/api/analyze refuses what would crash or stall the server', () => {
	it('the 176-byte V3000 molfile declaring 99,999,999 atoms → 422 structure_too_large', async () => {
		// Before the limits this request made openchemlib allocate for 10^8 atoms and the process died.
		const { status, body } = await callAnalyze({ structure: killer });
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'structure_too_large',
			message: expect.stringMatching(/declares 99,999,999 atoms/),
			details: { limit: { name: 'maxAtoms', max: STRUCTURE_LIMITS.maxAtoms, found: 99_999_999 } }
		});
	});
	it('a 10,000-atom SMILES → 422 structure_too_large', async () => {
		const { status, body } = await callAnalyze({ structure: 'C'.repeat(10_000) });
		expect(status).toBe(422);
		expect(body.error.code).toBe('structure_too_large');
		expect(body.error.message).toMatch(/10,000 atoms/);
	});
	it.each([
		['[Qq]', 'unknown_element'],
		['CC[Qq]', 'unknown_element'],
		['[999C]', 'bad_isotope']
	])('%s → 422 invalid_structure (%s)', async (structure, reason) => {
		const { status, body } = await callAnalyze({ structure });
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'invalid_structure',
			message: expect.any(String),
			details: { reason }
		});
	});
	it('a Qq atom in a molfile → 422 invalid_structure naming the atom', async () => {
		const molfile = [
			'',
			'  Orthogon',
			'',
			'  2  1  0  0  0  0  0  0  0  0999 V2000',
			'    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
			'    1.5000    0.0000    0.0000 Qq  0  0  0  0  0  0  0  0  0  0  0  0',
			'  1  2  1  0',
			'M  END',
			''
		].join('\n');
		const { status, body } = await callAnalyze({ structure: molfile });
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'invalid_structure',
			details: { reason: 'unknown_element', atom: 1 }
		});
		expect(body.error.message).toMatch(/Atom 2 has the symbol “Qq”/);
	});
	it('over the drawing limit: the analysis without the drawing, and a plain note saying so', async () => {
		const units = Math.ceil(STRUCTURE_LIMITS.maxDrawingHeavyAtoms / 6) + 1; // just over the cap
		const { status, body } = await callAnalyze({ structure: chain(units), depict: true });
		expect(status).toBe(200);
		expect(body.formula).toMatch(/^C/);
		expect(body.svg).toBeUndefined();
		expect(body.drawingSkipped).toMatch(
			new RegExp(`drawings are made for up to ${STRUCTURE_LIMITS.maxDrawingHeavyAtoms}`)
		);
		// Under the cap the drawing is there and no note.
		const small = await callAnalyze({ structure: chain(3), depict: true });
		expect(small.body.svg).toMatch(/^<svg/);
		expect(small.body.drawingSkipped).toBeUndefined();
	});
});

describe('the chemistry pool', () => {
	it('a task over its time budget answers 503 chemistry_timeout, and the pool serves the next call', async () => {
		await runChemistry('analyze', { text: 'CCO', options: {} }); // a started, warm worker
		process.env.ORTHOGON_CHEM_BUDGET_MS = '1';
		const { status, body } = await callAnalyze({ structure: chain(45), depict: true });
		expect(status).toBe(503);
		expect(body.error).toMatchObject({
			code: 'chemistry_timeout',
			message: expect.stringMatching(/took longer than 1 ms.*nothing was checked/)
		});
		delete process.env.ORTHOGON_CHEM_BUDGET_MS;
		const next = await callAnalyze({ structure: 'OCC(=O)O' });
		expect(next.status).toBe(200);
		expect(next.body.formula).toBe('C2H4O3'); // glycolic acid (common practice)
	});
	it('a full queue answers 503 chemistry_busy with retry-after', async () => {
		await closeChemistryPool();
		process.env.ORTHOGON_CHEM_THREADS = '1';
		process.env.ORTHOGON_CHEM_QUEUE = '1';
		const answers = await Promise.all(
			[0, 1, 2, 3, 4].map((i) => callAnalyze({ structure: chain(20 + i) }))
		);
		const busy = answers.filter((a) => a.status === 503);
		expect(busy.length).toBeGreaterThan(0);
		for (const answer of busy) {
			expect(answer.body.error).toMatchObject({
				code: 'chemistry_busy',
				message: expect.stringMatching(/busy/)
			});
			expect(answer.headers.get('retry-after')).toBe('5');
		}
		expect(answers.filter((a) => a.status === 200).length).toBeGreaterThan(0);
		await closeChemistryPool();
	});
	it('a cheap request is answered while a long chemistry task runs', async () => {
		await runChemistry('analyze', { text: 'CCO', options: {} });
		const finished: string[] = [];
		const long = callAnalyze({ structure: chain(48), depict: true }).then((answer) => {
			finished.push('chemistry');
			return answer;
		});
		// Let the chemistry request start before the cheap one is sent.
		await new Promise((resolve) => setTimeout(resolve, 0));
		const cheap = await (rules as unknown as Handler)(
			fakeEvent({ user: chemist, path: '/api/rules' }) as never
		);
		finished.push('cheap');
		expect(cheap.status).toBe(200);
		expect((await long).status).toBe(200);
		expect(finished).toEqual(['cheap', 'chemistry']);
	});
	it('refusals keep their code and details across the thread boundary', async () => {
		const refused = await runChemistry('analyze', { text: 'C1CC', options: {} }).catch(
			(caught) => caught
		);
		expect(refused).toBeInstanceOf(ApiFailure);
		expect(refused).toMatchObject({
			status: 422,
			code: 'invalid_structure',
			details: { reason: 'unclosed_ring', position: 4 }
		});
	});
});
