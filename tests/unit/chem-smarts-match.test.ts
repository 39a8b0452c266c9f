// The TypeScript SMARTS matcher (src/lib/chem/smarts-query.ts, smarts-match.ts) must list exactly
// the mappings openchemlib's own substructure search lists, for every pattern of the rule tables,
// on every reference structure and on every molecule perception imagines with a PG removed.
// Where it cannot read a SMARTS, the pattern must still be searched (by openchemlib).

import { describe, expect, it } from 'vitest';
import { SSSearcher, type Molecule } from 'openchemlib';
import { readStructure } from '../../src/lib/chem/parse';
import { perceive } from '../../src/lib/chem/perceive';
import { compilePattern, perceptionRules, type CompiledPattern } from '../../src/lib/chem/patterns';
import { atomTable } from '../../src/lib/chem/prefilter';
import { exactQuery } from '../../src/lib/chem/smarts-query';
import {
	allMappings,
	compareMappings,
	distinctMatches,
	firstPerAtomSet
} from '../../src/lib/chem/smarts-match';
import { findMatches, searchTarget } from '../../src/lib/chem/match';
import { withoutProtectingGroup } from '../../src/lib/chem/deprotect';
import { referenceMolecules } from '../reference/molecules';
import { aromaticityDisagreements } from '../reference/aromaticity-cases';
import { routeOG2031 } from '../factories/route-og2031';

/** Charges, explicit and heavy hydrogens, salts, Kekulé input, fused heteroaromatics: the corners. */
const CORNERS = [
	'C[N+](C)(C)CCO',
	'[NH3+]CC(=O)[O-]',
	'CC(=O)[O-].[Na+]',
	'[H]OCC=O',
	'[2H]OC(C)C',
	'OC1=CC=CC=C1CO',
	'O=[N+]([O-])c1ccc(CBr)cc1',
	'CCN=[N+]=[N-]',
	'C[n+]1ccc(CO)cc1',
	'c1ccc2c(c1)[nH]c1ccccc12',
	'C[S+](C)CC(O)=O',
	'[CH3-]',
	'OC1CC1',
	'CC(C)(C)OC(=O)n1ccc2ccccc21',
	'O=C(NCc1ccco1)OCc1ccccc1',
	'CS(=O)(=O)NCCO',
	'CP(C)(C)=O',
	'CS(C)=O',
	'CC=NCC[Si](C)(C)C'
];
const structures = [
	...referenceMolecules.map((m) => m.smiles),
	...routeOG2031.map((s) => s.smiles),
	...aromaticityDisagreements.map((c) => c.smiles),
	...CORNERS
];
const rules = perceptionRules();
const patterns = [
	...rules.groups.map((g) => g.compiled),
	...rules.protectingGroups.flatMap((pg) => pg.compiled)
];

/** Every openchemlib mapping, its exclusion placeholders (-1) dropped: SMARTS order. */
function openchemlibMappings(molecule: Molecule, pattern: CompiledPattern): number[][] {
	const searcher = new SSSearcher();
	searcher.setMolecule(molecule);
	searcher.setFragment(pattern.fragment);
	if (searcher.findFragmentInMolecule({ countMode: 'rigorous' }) === 0) {
		return [];
	}
	return searcher
		.getMatchList()
		.map((mapping) => mapping.filter((atom) => atom >= 0))
		.sort(compareMappings);
}

/** The molecules perception imagines: each found PG removed, as perceive.ts removes it. */
function freedMolecules(molecule: Molecule): Molecule[] {
	return perceive(molecule).protectingGroups.map((found) => {
		const pg = rules.protectingGroups.find((row) => row.id === found.id)!;
		const leaving = found.atoms.filter((atom) => !found.maskedAtoms.includes(atom));
		return withoutProtectingGroup(molecule, leaving, found.maskedAtoms, pg.restore).molecule;
	});
}

describe('the TypeScript SMARTS matcher', () => {
	it('reads every pattern of the rule tables (none is left to the slower openchemlib search)', () => {
		expect(patterns.filter((p) => !p.exact).map((p) => p.smarts)).toEqual([]);
	});

	it('lists exactly the mappings openchemlib lists, on every structure and every imagined removal', () => {
		let compared = 0;
		let matched = 0;
		let handedOver = 0;
		for (const smiles of structures) {
			const parsed = readStructure(smiles).molecule;
			for (const molecule of [parsed, ...freedMolecules(parsed)]) {
				const table = atomTable(molecule);
				for (const pattern of patterns) {
					const expected = openchemlibMappings(molecule, pattern);
					if (!table.plain) {
						// Odd atoms (next test): where the walk does answer, it answers as openchemlib does.
						const found = distinctMatches(table, pattern.exact!);
						if (found) {
							expect(found, `${pattern.smarts} on ${smiles}`).toEqual(firstPerAtomSet(expected));
						} else {
							handedOver++;
						}
						continue;
					}
					expect(allMappings(table, pattern.exact!), `${pattern.smarts} on ${smiles}`).toEqual(
						expected
					);
					// What perception uses: symmetric leaves in one order only, the same first mapping per atom set.
					expect(distinctMatches(table, pattern.exact!), `${pattern.smarts} on ${smiles}`).toEqual(
						firstPerAtomSet(expected)
					);
					compared++;
					if (expected.length > 0) {
						matched++;
					}
				}
			}
		}
		// Not a vacuous comparison: thousands of pairs, hundreds of them with matches.
		expect(compared).toBeGreaterThan(8000);
		expect(matched).toBeGreaterThan(500);
		// Charged corners exist, and only the searches that reach X or H on them go to openchemlib.
		expect(handedOver).toBeGreaterThan(0);
		expect(handedOver).toBeLessThan(compared / 50);
	}, 120_000);

	it('hands a search to openchemlib where it would test X or H on a charged atom, a radical or deuterium', () => {
		// openchemlib reads the sulfonium S+ with three carbons as X2, so its sulfide pattern matches
		// it (the loose pre-test, capping heavy neighbours at 2, says no first: exhaustive skips it here).
		const sulfonium = searchTarget(readStructure('C[S+](C)CC(O)=O').molecule, { exhaustive: true });
		expect(sulfonium.table.plain).toBe(false);
		expect(Array.from(sulfonium.table.odd)).toEqual([0, 1, 0, 0, 0, 0, 0]);
		const sulfide = rules.groupsById.get('sulfide')!.compiled;
		expect(distinctMatches(sulfonium.table, sulfide.exact!)).toBeNull();
		expect(findMatches(sulfonium, sulfide)).toEqual([
			[0, 1, 2],
			[0, 1, 3],
			[2, 1, 3]
		]);
		// A search that never tests X or H on the odd atom still runs here: the acid.
		const acid = rules.groupsById.get('carboxylic-acid')!.compiled;
		expect(distinctMatches(sulfonium.table, acid.exact!)).toEqual([[3, 4, 6, 5]]);
		// O–D is an OH to openchemlib: the deuterated alcohol is still a secondary alcohol.
		const deuterated = searchTarget(readStructure('[2H]OC(C)C').molecule, { exhaustive: true });
		const secondary = rules.groupsById.get('alcohol-secondary')!.compiled;
		expect(distinctMatches(deuterated.table, secondary.exact!)).toBeNull();
		expect(findMatches(deuterated, secondary)).toEqual([[1, 2, 3, 4]]);
		// Deuterium marks the atom bearing it too (its H count and neighbours are openchemlib's call).
		expect(Array.from(atomTable(readStructure('[2H]OC(C)C').molecule).odd)).toEqual([
			1, 1, 0, 0, 0
		]);
		for (const smiles of ['C[CH2]', 'O=[N+]([O-])c1ccccc1']) {
			expect(atomTable(readStructure(smiles).molecule).plain, smiles).toBe(false);
		}
	});

	it('reads SMARTS as openchemlib does where Daylight differs, and agrees on the corners', () => {
		const cases: [string, string][] = [
			['[OX2H]C', 'Oc1ccccc1'], // an upper-case symbol also matches an aromatic atom
			['cc', 'C1=CC=CC=C1'], // an unwritten bond between aromatic atoms is aromatic
			['CC', 'c1ccccc1'], // … and single between others, so it misses the ring bonds
			['[N+](=O)[O-]', 'O=[N+]([O-])c1ccccc1'],
			['[CX4;!$(C[OH])]', 'OCC'],
			['[#6]~[#8]', 'CC(=O)O'],
			['[Cl,Br,I][CH2]', 'ClCCBr'],
			['[nH]1cccc1', 'c1cc[nH]c1'],
			// r<n>: the smallest ring's size, so indole's fused carbons are r5 and norbornane has no r6.
			['[c;r5]', 'c1ccc2[nH]ccc2c1'],
			['[c;r6]', 'c1ccc2[nH]ccc2c1'],
			['[C;r5]', 'C1CC2CCC1C2'],
			['[C;r6]', 'C1CC2CCC1C2'],
			['[C,N;r5]C', 'C1CCCC1N'],
			// D<n>: explicit connections, D4 also five or six of them.
			['[O;D1]', 'CC(=O)O'],
			['[C;!D1]', 'CC(C)C'],
			['[S;D4]', 'FS(F)(F)(F)(F)F'],
			['[S;D4]', 'CS(=O)(=O)C']
		];
		for (const [smarts, smiles] of cases) {
			const molecule = readStructure(smiles).molecule;
			const pattern = compilePattern(smarts, 'test', []);
			expect(pattern.exact, smarts).not.toBeNull();
			expect(allMappings(atomTable(molecule), pattern.exact!), `${smarts} on ${smiles}`).toEqual(
				openchemlibMappings(molecule, pattern)
			);
		}
	});

	it('leaves syntax it does not read to openchemlib, which still finds the matches', () => {
		for (const smarts of [
			'[C;R]O',
			'C-,:C',
			'[C@H](O)C',
			'[13C]',
			'C.C',
			'[H]',
			'[D5]C',
			'[C;r8]',
			'[C;!r5]',
			'[C;r5,r6]'
		]) {
			expect(exactQuery(smarts), smarts).toBeNull();
		}
		const ringCarbinol = compilePattern('[C;R][OH]', 'test', []);
		expect(ringCarbinol.exact).toBeNull();
		const target = searchTarget(readStructure('OC1CCCCC1CO').molecule);
		expect(findMatches(target, ringCarbinol)).toEqual([[1, 0]]);
	});

	it('keeps the first mapping of each atom set, in ascending order, on both paths', () => {
		const tbs = rules.protectingGroups.find((pg) => pg.id === 'TBS')!.compiled[0]!;
		const target = searchTarget(readStructure('CC(C)(C)[Si](C)(C)OCCO[Si](C)(C)C(C)(C)C').molecule);
		const matches = findMatches(target, tbs);
		// 12 mappings per TBS ether (methyl orders), two TBS ethers: two matches, found without the other 22.
		expect(allMappings(target.table, tbs.exact!)).toHaveLength(24);
		expect(distinctMatches(target.table, tbs.exact!)).toEqual(matches);
		expect(matches.map((m) => m.slice(0, 2))).toEqual([
			[7, 8],
			[10, 9]
		]);
		const viaOpenchemlib = { ...tbs, exact: null, key: tbs.key };
		expect(
			findMatches(searchTarget(target.molecule), viaOpenchemlib).map((m) => m.filter((a) => a >= 0))
		).toEqual(matches);
	});
});
