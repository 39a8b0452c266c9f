// RDKit (the @rdkit/rdkit WASM build from npm) as the outside reference for substructure counts.

import type { MainModule } from '@rdkit/rdkit';

let loading: Promise<MainModule> | null = null;

/** The RDKit module, initialised once per test file (about 0.2 s). */
export function rdkit(): Promise<MainModule> {
	loading ??= import('@rdkit/rdkit').then(async (module) => {
		const initRDKitModule = module.default;
		return initRDKitModule();
	});
	return loading;
}

/**
 * RDKit's matches of a SMARTS in a SMILES, each as a sorted atom set. RDKit de-duplicates
 * matches that cover the same atoms (uniquify, on by default), which is what we compare with.
 */
export function rdkitMatches(RDKit: MainModule, smiles: string, smarts: string): number[][] {
	const mol = RDKit.get_mol(smiles);
	const query = RDKit.get_qmol(smarts);
	try {
		if (!mol || !mol.is_valid()) {
			throw new Error(`RDKit cannot read ${smiles}`);
		}
		if (!query || !query.is_valid()) {
			throw new Error(`RDKit cannot read the SMARTS ${smarts}`);
		}
		const parsed: unknown = JSON.parse(mol.get_substruct_matches(query));
		// No match comes back as "{}", not "[]".
		if (!Array.isArray(parsed)) {
			return [];
		}
		return (parsed as { atoms: number[] }[]).map((match) => [...match.atoms].sort((a, b) => a - b));
	} finally {
		mol?.delete();
		query?.delete();
	}
}

/** A canonical text form of a list of atom sets, for equality checks. */
export function atomSetKey(sets: number[][]): string {
	return sets
		.map((set) => set.join(','))
		.sort()
		.join(' | ');
}
