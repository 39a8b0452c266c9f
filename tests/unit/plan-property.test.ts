import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { checkRouteDocument } from '../../src/lib/server/services/check';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// Property: whatever route the planner is given, every plan it returns re-checks with no
// `clash` through the same check the route map uses, and every PG it drew is perceived where it
// says. Routes are generated from invented OG-2031 fragments: one or two bystanders on a chain
// that one or two on-purpose steps work on, and convergent couplings of two halves.

const BYSTANDERS = ['OCC', 'NCC', 'SCC', 'Oc1ccc(cc1)C', 'CC(=O)C', 'C#CC', 'OCC(O)C', 'OC(=O)C'];
const STEPS = [
	{ from: 'CCCC(C)=O', to: 'CCCC(C)(C)O', reagents: 'MeMgBr, THF' },
	{ from: 'CCCCO', to: 'CCCC=O', reagents: '(COCl)2, DMSO, Et3N' },
	{ from: 'CCC=CC', to: 'CCCCC', reagents: 'H2, Pd/C, EtOH' },
	{ from: 'CCCC=O', to: 'CCCCO', reagents: 'NaBH4, MeOH' }
];

function* routes() {
	for (const [b, bystander] of BYSTANDERS.entries()) {
		for (const [s, step] of STEPS.entries()) {
			if ((b + s) % 2) continue; // a spread of pairs, not every pair: keeps the run short
			yield line([bystander + step.from, bystander + step.to], [step.reagents], `OG-2031 generated ${b}-${s}`);
		}
	}
	// Convergent: an acid half with a bystander coupled to an amine half (HATU acylates amines,
	// thiols and alcohols that stand by, so the bystander may need a mask on its own branch).
	for (const [b, bystander] of BYSTANDERS.entries()) {
		if (b % 2) continue;
		yield {
			name: `OG-2031 generated coupling ${b}`,
			intermediates: [
				{ id: 'acid', structure: `${bystander}CCC(=O)O` },
				{ id: 'amine', structure: 'NCc1ccccc1' },
				{ id: 'amide', structure: `${bystander}CCC(=O)NCc1ccccc1` }
			],
			steps: [{ id: 'join', from: ['acid', 'amine'], to: 'amide', reagents: 'HATU, DIPEA, DMF' }]
		};
	}
	// Two steps: a Grignard addition then a hydrogenation, with a ketone standing by both.
	yield line(['CC(=O)CCC=CCCC=O', 'CC(=O)CCC=CCCC(C)O', 'CC(=O)CCCCCCC(C)O'], ['MeMgBr, THF', 'H2, Pd/C, EtOH'], 'OG-2031 two steps');
}

describe('every returned plan re-checks clean', () => {
	it('holds for generated routes', () => {
		let plans = 0;
		for (const route of routes()) {
			const answer = planRouteDocument(route);
			for (const plan of answer.plans) {
				plans++;
				const clashes = checkRouteDocument(plan.route).flatMap((step) => [...(step.error ? [step.error.message] : []), ...step.clashes.filter((c) => c.severity === 'clash').map((c) => c.message)]);
				expect(clashes, `${route.name}, plan ${plan.rank}`).toEqual([]);
				for (const protection of plan.protections) {
					const drawn = plan.route.intermediates.find((n) => n.id === protection.intermediate)!;
					expect(perceiveText(drawn.structure).protectingGroups.map((pg) => pg.id)).toContain(protection.protectingGroup);
				}
			}
		}
		expect(plans).toBeGreaterThan(10);
	});
});
