import { describe, expect, it } from 'vitest';
import { buildRequest, placeErrors, prefilledRows } from '../../src/lib/client/quantities-rows';
import type { RouteDocument } from '../../src/lib/route/document';

// An invented aldehyde and its ethylene acetal (4-methylbenzaldehyde as the worked example of
// issue 14; its dioxolane). Structures are plain SMILES.
const doc: RouteDocument = {
	name: 'acetal test',
	intermediates: [
		{ id: 'ald', label: 'OG-5001-A aldehyde', structure: 'Cc1ccc(C=O)cc1' },
		{ id: 'acetal', label: 'OG-5001-B dioxolane', structure: 'Cc1ccc(C2OCCO2)cc1' }
	],
	steps: [{ id: 's1', from: ['ald'], to: 'acetal', reagents: 'ethylene glycol, TsOH, toluene' }]
};

describe('prefilledRows', () => {
	it('starts from the step’s own intermediates: the substrate limiting, the product last', () => {
		expect(prefilledRows(doc.steps[0]!, doc)).toEqual([
			{ name: 'OG-5001-A aldehyde', role: 'limiting', structure: 'ald' },
			{ name: 'OG-5001-B dioxolane', role: 'product', structure: 'acetal' }
		]);
	});

	it('names unlabelled intermediates plainly and makes only the first of two substrates limiting', () => {
		const convergent: RouteDocument = {
			name: 'c',
			intermediates: [
				{ id: 'x', structure: 'CO' },
				{ id: 'y', structure: 'CC(=O)O' },
				{ id: 'z', structure: 'CC(=O)OC' }
			],
			steps: [{ id: 's', from: ['x', 'y'], to: 'z' }]
		};
		expect(prefilledRows(convergent.steps[0]!, convergent).map((r) => [r.name, r.role])).toEqual([
			['substrate 1', 'limiting'],
			['substrate 2', 'reagent'],
			['product', 'product']
		]);
	});
});

describe('buildRequest', () => {
	const rows = prefilledRows(doc.steps[0]!, doc);

	it('waits for the limiting amount, and says what is missing', () => {
		const result = buildRequest(rows, doc);
		expect(result).toEqual({
			ready: false,
			why: 'Enter how much OG-5001-A aldehyde you use (e.g. 20 g).'
		});
	});

	it('refuses no limiting material, and two', () => {
		const none = rows.map((r) => ({ ...r, role: 'reagent' as const }));
		expect(buildRequest(none, doc)).toMatchObject({ ready: false, why: /Mark one material/ });
		const two = rows.map((r) => ({ ...r, role: 'limiting' as const, mass: 1 }));
		expect(buildRequest(two, doc)).toMatchObject({ ready: false, why: /only one/ });
	});

	it('replaces intermediate ids by their structures and keeps typed SMILES and the water card', () => {
		const filled = [
			{ ...rows[0]!, mass: 20 },
			{ name: 'ethylene glycol', role: 'reagent' as const, volume: 12 },
			{ name: 'TsOH', role: 'catalyst' as const, structure: 'Cc1ccc(S(=O)(=O)O)cc1', equiv: 0.02 },
			rows[1]!
		];
		const result = buildRequest(filled, doc, { solvent: 'toluene', trapCapacity: 10 });
		expect(result).toEqual({
			ready: true,
			request: {
				materials: [
					{ name: 'OG-5001-A aldehyde', role: 'limiting', structure: 'Cc1ccc(C=O)cc1', mass: 20 },
					{ name: 'ethylene glycol', role: 'reagent', volume: 12 },
					{ name: 'TsOH', role: 'catalyst', structure: 'Cc1ccc(S(=O)(=O)O)cc1', equiv: 0.02 },
					{ name: 'OG-5001-B dioxolane', role: 'product', structure: 'Cc1ccc(C2OCCO2)cc1' }
				],
				waterRemoval: { solvent: 'toluene', trapCapacity: 10 }
			}
		});
	});
});

describe('placeErrors puts each refusal where the chemist can act on it', () => {
	const rows = [
		{ name: 'aldehyde', role: 'limiting' as const, mass: 20 },
		{ name: 'mystery oil', role: 'reagent' as const, volume: 5 }
	];

	it('on the row a zod-style path points to, and on the water card', () => {
		const placed = placeErrors(
			{
				message: 'Invalid body',
				details: [
					{ path: ['materials', 1, 'volume'], message: 'A density is needed for mystery oil.' },
					{ path: 'waterRemoval.log.2.minutes', message: 'Times go backwards.' }
				]
			},
			rows
		);
		expect([...placed.rows]).toEqual([[1, ['A density is needed for mystery oil.']]]);
		expect(placed.water).toEqual(['Times go backwards.']);
		expect(placed.general).toEqual([]);
	});

	it('on the row the engine names in its details (a 422 from POST /api/quantities)', () => {
		const placed = placeErrors(
			{
				message: 'Give a density for this liquid.',
				details: { material: 'mystery oil', field: 'density' }
			},
			rows
		);
		expect([...placed.rows]).toEqual([[1, ['Give a density for this liquid.']]]);
	});

	it('on the row whose name the message quotes, or above the table when it names none', () => {
		const named = placeErrors({ message: 'No density is known for “mystery oil”.' }, rows);
		expect([...named.rows]).toEqual([[1, ['No density is known for “mystery oil”.']]]);
		const solvent = placeErrors({ message: 'Unknown solvent “xylol”; known: toluene.' }, rows);
		expect(solvent.water).toHaveLength(1);
		const neither = placeErrors({ message: 'The server could not be reached.' }, rows);
		expect(neither.general).toEqual(['The server could not be reached.']);
	});
});
