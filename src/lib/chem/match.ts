// Running compiled patterns against a molecule with openchemlib's substructure search.
//
// A search costs tens of microseconds even when it fails, so before searching we check cheap
// molecule features: the elements a pattern names, and the `needs` a rule row declares (a free
// O–H, a C=O, a found group such as "silyl-ether", …), then the loose TypeScript walk of
// prefilter.ts. tests/unit/chem-perceive.test.ts runs every pattern with and without these checks
// over the reference set to prove they never hide a match.

import { Molecule, SSSearcher } from 'openchemlib';
import type { CompiledPattern } from './patterns';
import { atomTable, mayMatch, type AtomTable } from './prefilter';

/** Features a rule row may list under `needs` (group ids may be listed too). */
export const MOLECULE_FEATURES = ['O-H', 'N-H', 'S-H', 'C=O', 'C=C', 'C=N', 'triple', 'ring-3'] as const;

/** One molecule prepared for many searches: its searcher and the features it has. */
export type SearchTarget = {
	molecule: Molecule;
	/** Made on first use: when the pre-checks rule out every pattern, no searcher is built. */
	readonly searcher: SSSearcher;
	/** The molecule as prefilter.ts reads it. */
	table: AtomTable;
	/** Element numbers, feature names and (once perceived) the ids of groups present. */
	features: Set<string | number>;
	/** Skip the pre-checks (tests prove they change nothing). */
	exhaustive: boolean;
};

/** Prepares a molecule for repeated pattern searches, e.g. `searchTarget(Molecule.fromSmiles('CCO'))`. */
export function searchTarget(molecule: Molecule, options: { exhaustive?: boolean } = {}): SearchTarget {
	molecule.ensureHelperArrays(Molecule.cHelperRings);
	const features = new Set<string | number>();
	for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
		const element = molecule.getAtomicNo(atom);
		features.add(element);
		if (molecule.getAllHydrogens(atom) > 0) {
			if (element === 8) features.add('O-H');
			else if (element === 7) features.add('N-H');
			else if (element === 16) features.add('S-H');
		}
		if (molecule.getAtomRingSize(atom) === 3) features.add('ring-3');
	}
	for (let bond = 0; bond < molecule.getAllBonds(); bond++) {
		const order = molecule.getBondOrder(bond);
		if (order === 3) features.add('triple');
		if (order !== 2 || molecule.isAromaticBond(bond)) continue;
		const pair = [molecule.getAtomicNo(molecule.getBondAtom(0, bond)), molecule.getAtomicNo(molecule.getBondAtom(1, bond))].sort();
		if (pair[0] === 6 && pair[1] === 8) features.add('C=O');
		else if (pair[0] === 6 && pair[1] === 6) features.add('C=C');
		else if (pair[0] === 6 && pair[1] === 7) features.add('C=N');
	}
	let searcher: SSSearcher | null = null;
	return {
		molecule,
		get searcher() {
			if (!searcher) {
				searcher = new SSSearcher();
				searcher.setMolecule(molecule);
			}
			return searcher;
		},
		table: atomTable(molecule),
		features,
		exhaustive: options.exhaustive ?? false
	};
}

/** Whether the target has everything a row needs, e.g. `hasFeatures(target, ['C=O'])`. */
export function hasFeatures(target: SearchTarget, needs: readonly (string | number)[]): boolean {
	return target.exhaustive || needs.every((need) => target.features.has(need));
}

/**
 * Every match with a distinct atom set, as fragment-index → molecule-atom arrays (-1 for atoms
 * openchemlib only uses to exclude), e.g. `findMatches(target, compiled)` → `[[3, 4, 5]]`.
 * 'overlapping' mode drops matches that cover exactly the same atoms, as RDKit's uniquify does.
 */
export function findMatches(target: SearchTarget, pattern: CompiledPattern): number[][] {
	if (!hasFeatures(target, pattern.requiredElements)) return [];
	if (!target.exhaustive && pattern.loose && !mayMatch(target.table, pattern.loose)) return [];
	target.searcher.setFragment(pattern.fragment);
	const count = target.searcher.findFragmentInMolecule({ countMode: 'overlapping' });
	return count === 0 ? [] : target.searcher.getMatchList();
}

/** The molecule atoms of a match, without excluded placeholders, sorted, e.g. `matchedAtoms([5, -1, 2])` → `[2, 5]`. */
export function matchedAtoms(match: number[]): number[] {
	return match.filter((atom) => atom >= 0).sort((a, b) => a - b);
}
