import { Molecule } from 'openchemlib';
import { afterAll, describe, expect, it, vi } from 'vitest';
import type { RouteDocument } from '../../src/lib/route/document';
import { line, STRESS_ROUTE, TEXTBOOK_ROUTES } from '../factories/plan-routes';

// The planner's fast paths must not change any answer: drawing protected intermediates by editing
// the SMILES (chem/smiles-splice.ts) instead of the Reactor, and mapping a step's atoms through the
// text both SMILES share (chem/text-atom-map.ts) instead of the MCS. Switched off, the planner
// runs the slow paths; both must give the same plans, protections, steps, rationale and re-check
// results, and the same molecules (openchemlib ID codes, stereo included). Routes: the bench's
// textbook and stress routes and one with stereocentres and an E alkene (invented OG-2031).

type PlanDocument = (doc: RouteDocument) => unknown;

// How often the switched-off fast paths were asked: proof that the slow run took the slow paths.
const asked = { splice: 0, textMap: 0 };

async function planner(fast: boolean): Promise<PlanDocument> {
	vi.resetModules();
	if (fast) {
		vi.doUnmock('../../src/lib/chem/smiles-splice');
		vi.doUnmock('../../src/lib/chem/text-atom-map');
	} else {
		vi.doMock('../../src/lib/chem/text-atom-map', () => ({
			mapAtomsByText: () => {
				asked.textMap++;
				return null;
			}
		}));
		vi.doMock('../../src/lib/chem/smiles-splice', async (original) => {
			const real = await original<typeof import('../../src/lib/chem/smiles-splice')>();
			return {
				...real,
				spliceTransforms: () => {
					asked.splice++;
					throw new real.SpliceUnsupported('the Reactor path, for comparison');
				}
			};
		});
	}
	return (await import('../../src/lib/server/services/plan')).planRouteDocument;
}

/** The answer with every structure as its ID code, so two writings of one molecule compare equal. */
function byMolecule(answer: unknown): unknown {
	return JSON.parse(JSON.stringify(answer), (key, value) =>
		key === 'structure' && typeof value === 'string'
			? Molecule.fromSmiles(value).getIDCode()
			: value
	);
}

const STEREO_ROUTE = line(
	[
		'C/C=C/[C@H](O)[C@@H](C)CC(=O)OC',
		'C/C=C/[C@H](O)[C@@H](C)CC(C)(C)O',
		'C/C=C/C(=O)[C@@H](C)CC(C)(C)O'
	],
	['MeMgBr, THF', 'DMP, CH2Cl2']
);

afterAll(() => {
	// The stress route's steps pair five ketones and five alcohols each: the text map was asked.
	expect(asked.textMap).toBeGreaterThan(0);
	vi.doUnmock('../../src/lib/chem/smiles-splice');
	vi.doUnmock('../../src/lib/chem/text-atom-map');
	vi.resetModules();
});

describe('the fast paths answer as the slow ones did', () => {
	const routes: [string, RouteDocument][] = [
		...TEXTBOOK_ROUTES.map((doc, i): [string, RouteDocument] => [`textbook route ${i + 1}`, doc]),
		['route with stereocentres and an E alkene', STEREO_ROUTE],
		['10-group stress route', STRESS_ROUTE]
	];
	for (const [name, doc] of routes) {
		it(`on the ${name}`, { timeout: 60_000 }, async () => {
			const slow = (await planner(false))(doc);
			const fast = (await planner(true))(doc);
			expect((fast as { plans: unknown[] }).plans.length).toBeGreaterThan(0);
			expect(byMolecule(fast)).toEqual(byMolecule(slow));
			// The splicer did run: a drawn intermediate keeps the chemist's writing around the PG.
			expect(JSON.stringify(fast)).not.toEqual(JSON.stringify(slow));
			expect(asked.splice).toBeGreaterThan(0);
		});
	}
});
