import { describe, expect, it } from 'vitest';
import { POST } from '../../src/routes/api/analyze/+server';
import { fakeEvent } from '../factories';
import type { SessionUser } from '../../src/lib/types';

// The handler needs a user on locals and nothing from the database.
const chemist: SessionUser = {
	id: '00000000-0000-4000-8000-000000000031',
	email: 'chemist@lab.example',
	name: 'Chemist'
};

type Handler = (event: never) => Promise<Response>;
const call = async (body: unknown, user: SessionUser | null = chemist) => {
	const response = await (POST as unknown as Handler)(
		fakeEvent({ user, path: '/api/analyze', method: 'POST', body }) as never
	);
	return { status: response.status, body: await response.json() };
};

// OG-2044-19: Boc on a primary amine, TBS on a secondary alcohol.
const OG_2044_19 = 'CC(C)(C)OC(=O)NCC[C@H](C)O[Si](C)(C)C(C)(C)C';

describe('POST /api/analyze', () => {
	it('answers formula, mass, canonical key, groups and PGs in the documented shape', async () => {
		const { status, body } = await call({ structure: OG_2044_19 });
		expect(status).toBe(200);
		expect(Object.keys(body).sort()).toEqual([
			'canonical',
			'formula',
			'groups',
			'mass',
			'protectingGroups'
		]);
		expect(body.formula).toBe('C15H33NO3Si'); // counted by hand from the SMILES
		// 12.011×15 + 1.008×33 + 14.007 + 15.999×3 + 28.085 = 303.52 (IUPAC standard atomic weights, from memory)
		expect(body.mass).toBeCloseTo(303.52, 2);
		expect(body.canonical).toEqual(expect.any(String));
		expect(body.groups).toEqual(
			expect.arrayContaining([
				{ id: 'carbamate', atoms: expect.any(Array) },
				{ id: 'silyl-ether', atoms: expect.any(Array) }
			])
		);
		expect(
			body.protectingGroups.map((pg: { id: string; masks: string }) => [pg.id, pg.masks]).sort()
		).toEqual([
			['Boc', 'amine-primary'],
			['TBS', 'alcohol-secondary']
		]);
		for (const pg of body.protectingGroups) {
			expect(Object.keys(pg).sort()).toEqual(['atoms', 'id', 'masks']);
		}
	});
	it('gives the same canonical key for another writing of the molecule, and a molfile', async () => {
		const a = await call({ structure: 'OCC(=O)OC' });
		const b = await call({ structure: 'COC(=O)CO' });
		expect(a.body.canonical).toBe(b.body.canonical);
	});
	it('draws an SVG on request, with a highlight', async () => {
		const { status, body } = await call({ structure: OG_2044_19, depict: true, highlight: 'TBS' });
		expect(status).toBe(200);
		expect(body.svg).toMatch(/^<svg[\s\S]*<\/svg>\s*$/);
		expect((await call({ structure: OG_2044_19 })).body.svg).toBeUndefined();
	});
	it('answers 401 without a user', async () => {
		expect((await call({ structure: 'CCO' }, null)).status).toBe(401);
	});
	it('answers 400 for malformed JSON and for the wrong shape', async () => {
		expect((await call('{"structure": ')).status).toBe(400);
		const missing = await call({ smiles: 'CCO' });
		expect(missing.status).toBe(400);
		expect(missing.body.error.code).toBe('invalid_body');
		expect((await call({ structure: 42 })).status).toBe(400);
		expect((await call({ structure: 'CCO', depict: 'yes' })).status).toBe(400);
	});
	it('answers 413 for a body over 2 MB', async () => {
		const { status, body } = await call({ structure: 'C'.repeat(2.5 * 1024 * 1024) });
		expect(status).toBe(413);
		expect(body.error.code).toBe('too_large');
	});
	it.each([
		['', 'empty'],
		['C1CCC', 'unclosed_ring'],
		['CC(C)(C)(C)(C)C', 'bad_valence'],
		['not a molecule', 'smiles_syntax'],
		['line one\nline two', 'unknown_format']
	])('answers 422 invalid_structure for %j (%s)', async (structure, reason) => {
		const { status, body } = await call({ structure });
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'invalid_structure',
			message: expect.any(String),
			details: { reason }
		});
	});
	it('answers 422 structure_too_large for text over 1 MB, naming the limit', async () => {
		const { status, body } = await call({ structure: 'C'.repeat(1024 * 1024 + 10) });
		expect(status).toBe(422);
		expect(body.error).toMatchObject({
			code: 'structure_too_large',
			details: { reason: 'too_large', limit: { name: 'maxTextBytes' } }
		});
	});
	it('says where a SMILES goes wrong', async () => {
		const { body } = await call({ structure: 'CC(=O)OC1CC' });
		expect(body.error.details).toMatchObject({ reason: 'unclosed_ring', position: 11 });
		expect(body.error.message).toMatch(/character 12/);
	});
	it('answers 422 invalid_highlight for a highlight that names nothing in the structure', async () => {
		const { status, body } = await call({ structure: 'CCO', depict: true, highlight: 'TBS' });
		expect(status).toBe(422);
		expect(body.error.code).toBe('invalid_highlight');
	});
	it('keeps answering after a run of bad requests', async () => {
		for (const structure of ['((((', 'c1cccc1', '\u0000', '[', 'C%', '$$$$']) {
			expect((await call({ structure })).status).toBe(422);
		}
		expect((await call({ structure: 'CCO' })).status).toBe(200);
	});
});
