// The routes `npm run bench` times the planner on, shared with the test that the planner's fast
// paths (SMILES splicing, text atom maps) answer exactly as the slow ones did
// (tests/unit/plan-fast-paths.test.ts).

import type { RouteDocument } from '../../src/lib/route/document';
import { line } from '../../tests/factories/plan-routes';

// Ten sensitive group instances (five ketones and five primary alcohols standing by a Grignard
// addition, then a Swern oxidation of the alcohol it makes), invented OG-2031 intermediates.
const ARMS = 'C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C(CC(C)=O)C(CCO)C';
export const STRESS_ROUTE: RouteDocument = {
	name: 'OG-2031 ten-arm bench',
	intermediates: [
		{ id: 'a', structure: `O=CC${ARMS}` },
		{ id: 'b', structure: `CC(O)C${ARMS}` },
		{ id: 'c', structure: `CC(=O)C${ARMS}` }
	],
	steps: [
		{ id: 'grignard', from: ['a'], to: 'b', reagents: 'MeMgBr, THF' },
		{ id: 'swern', from: ['b'], to: 'c', reagents: '(COCl)2, DMSO, Et3N' }
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
