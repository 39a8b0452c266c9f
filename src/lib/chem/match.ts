// Running compiled patterns against a molecule.
//
// Two ways to search: the exact TypeScript matcher (smarts-match.ts) over the molecule's atom
// table, used for every pattern smarts-query.ts can read on a plain molecule (no charges), and
// openchemlib's substructure search for the rest. Before either, cheap molecule features are
// checked: the elements a pattern names and the `needs` a rule row declares (a free O–H, a C=O, a
// found group such as "silyl-ether", …); before openchemlib also the loose walk of prefilter.ts.
// tests/unit/chem-perceive.test.ts runs every pattern with and without these checks over the
// reference set to prove they never hide a match.

import { Molecule, SSSearcher } from 'openchemlib';
import type { CompiledPattern } from './compile-pattern';
import { atomTable, mayMatch, type AtomTable } from './prefilter';
import { compareMappings, distinctMatches, firstPerAtomSet, matchedAtoms } from './smarts-match';

export { matchedAtoms };

/** Features a rule row may list under `needs` (group ids may be listed too). */
export const MOLECULE_FEATURES = [
	'O-H',
	'N-H',
	'S-H',
	'C=O',
	'C=C',
	'C=N',
	'triple',
	'ring-3'
] as const;

/** One molecule prepared for many searches: its searcher and the features it has. */
export type SearchTarget = {
	readonly molecule: Molecule;
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
export function searchTarget(
	molecule: Molecule,
	options: { exhaustive?: boolean } = {}
): SearchTarget {
	molecule.ensureHelperArrays(Molecule.cHelperRings);
	const features = new Set<string | number>();
	for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
		const element = molecule.getAtomicNo(atom);
		features.add(element);
		if (molecule.getAllHydrogens(atom) > 0) {
			if (element === 8) {
				features.add('O-H');
			} else if (element === 7) {
				features.add('N-H');
			} else if (element === 16) {
				features.add('S-H');
			}
		}
		if (molecule.getAtomRingSize(atom) === 3) {
			features.add('ring-3');
		}
	}
	for (let bond = 0; bond < molecule.getAllBonds(); bond++) {
		const order = molecule.getBondOrder(bond);
		if (order === 3) {
			features.add('triple');
		}
		if (order !== 2 || molecule.isAromaticBond(bond)) {
			continue;
		}
		const pair = [
			molecule.getAtomicNo(molecule.getBondAtom(0, bond)),
			molecule.getAtomicNo(molecule.getBondAtom(1, bond))
		].sort();
		if (pair[0] === 6 && pair[1] === 8) {
			features.add('C=O');
		} else if (pair[0] === 6 && pair[1] === 6) {
			features.add('C=C');
		} else if (pair[0] === 6 && pair[1] === 7) {
			features.add('C=N');
		}
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
 * Every match with a distinct atom set, as mappings pattern atom → molecule atom (indices as the
 * pattern's roles use them; -1 for atoms openchemlib only uses to exclude), in ascending order of
 * the mapping arrays, e.g. `findMatches(target, compiled)` → `[[3, 4, 5]]`. Matches that cover
 * exactly the same atoms count once (the first mapping in that order), as RDKit's uniquify does.
 */
export function findMatches(target: SearchTarget, pattern: CompiledPattern): number[][] {
	if (!hasFeatures(target, pattern.requiredElements)) {
		return [];
	}
	const exact = pattern.exact && distinctMatches(target.table, pattern.exact);
	if (exact) {
		return exact;
	}
	if (!target.exhaustive && pattern.loose && !mayMatch(target.table, pattern.loose)) {
		return [];
	}
	target.searcher.setFragment(pattern.fragment);
	// 'rigorous' lists every mapping, symmetric ones too: 2–5× cheaper than 'overlapping' on a
	// TBS pattern (12 mappings per TBS ether), and sorting gives the same order as the TS path.
	if (target.searcher.findFragmentInMolecule({ countMode: 'rigorous' }) === 0) {
		return [];
	}
	const mappings = target.searcher.getMatchList();
	// An exact pattern's roles count in SMARTS order: drop the placeholders of `!$()` atoms.
	const ordered = pattern.exact
		? mappings.map((mapping) => mapping.filter((atom) => atom >= 0))
		: mappings;
	return firstPerAtomSet(ordered.sort(compareMappings));
}
