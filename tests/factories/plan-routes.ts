// Routes for the planner: `line` builds a linear one; STRESS_ROUTE and TEXTBOOK_ROUTES are the
// routes `npm run bench` times the planner on (scripts/bench/plan.ts), shared with the tests that
// the planner's fast paths answer exactly as the slow ones did (plan-fast-paths, chem-text-atom-map).

import type { RouteDocument } from '../../src/lib/route/document';

/** A linear route i0 → i1 → … with steps s1, s2, …; e.g. `line(['CC=O', 'CCO'], ['NaBH4, MeOH'])`. */
export function line(
	structures: string[],
	reagents: string[],
	name = 'OG-2031 fragment'
): RouteDocument {
	return {
		name,
		intermediates: structures.map((structure, i) => ({ id: `i${i}`, structure })),
		steps: reagents.map((r, i) => ({
			id: `s${i + 1}`,
			from: [`i${i}`],
			to: `i${i + 1}`,
			reagents: r
		}))
	};
}

// Ten sensitive group instances (five ketones and five primary alcohols standing by a double
// Grignard addition to a methyl ester, then a POCl3 dehydration of the tertiary alcohol it
// makes), invented OG-2031 intermediates. (An aldehyde start would leave no plan at all: a
// ketone cannot be ketalised beside a free aldehyde, which takes the diol first.)
const ARMS = 'C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C';
export const STRESS_ROUTE: RouteDocument = {
	name: 'OG-2031 ten-arm bench',
	intermediates: [
		{ id: 'a', structure: `COC(=O)CC${ARMS}` },
		{ id: 'b', structure: `CC(C)(O)CC${ARMS}` },
		{ id: 'c', structure: `CC(C)=CC${ARMS}` }
	],
	steps: [
		{ id: 'grignard', from: ['a'], to: 'b', reagents: 'MeMgBr (3 equiv), THF' },
		{ id: 'dehydration', from: ['b'], to: 'c', reagents: 'POCl3, pyridine' }
	]
};

// Ordinary routes from the textbook cases (invented OG-2031 intermediates).
export const TEXTBOOK_ROUTES: RouteDocument[] = [
	line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['MeMgBr, THF']),
	line(
		['OCC(O)CC=CCCO', 'OCC(O)CC=CCC=O', 'OCC(O)CCCCC=O', 'OCC(O)CCCCC(C)O'],
		['(COCl)2, DMSO, Et3N', 'H2, Pd/C, EtOH', 'MeMgBr, THF']
	),
	line(
		[
			'NCCC(CC(=O)O)CCN=[N+]=[N-]',
			'NCCC(CC(=O)OC)CCN=[N+]=[N-]',
			'NCCC(CC(=O)OC)CCN',
			'CC(=O)NCCC(CC(=O)OC)CCN',
			'CC(=O)NCCC(CC(=O)OC)CCNC(=O)c1ccccc1'
		],
		['MeI, K2CO3, DMF', 'PPh3, THF, H2O', 'Ac2O, pyridine', 'BzCl, Et3N, CH2Cl2']
	),
	line(['OCCCCC(=O)OC', 'OCCCCC(C)(C)O', 'OCCCCC(C)=C'], ['MeMgBr, THF', 'TsOH, toluene, reflux'])
];
