// Structure texts read once for all the readers of a route's intermediates: perception, the
// check's atom mapping and PG sites, the planner's step mapping and drawing. The planner and the
// re-check of its plans read the same texts many times (each drawn intermediate ~4 times), and a
// 130-atom SMILES costs openchemlib ~1.5 ms to parse.

import type { Molecule } from 'openchemlib';
import { LruCache } from './cache';
import { readStructure } from './parse';

// openchemlib holds some dozens of numbers an atom; 1 KB an atom bounds it generously.
const molecules = new LruCache<Molecule>(
	'moleculesByText',
	undefined,
	(m) => m.getAllAtoms() * 1024
);

/**
 * The molecule of a structure text as perception reads it (no coordinates, no stereo, no
 * warnings), e.g. `sharedMolecule('OCCO').getAllAtoms()` → 4. The instance is shared: read it,
 * never change it (copy it with `getCompactCopy()` first). Throws StructureError like readStructure.
 */
export function sharedMolecule(text: string): Molecule {
	return molecules.getOrSet(text, () => readStructure(text, { warnings: false }).molecule);
}

/** Forgets the parsed molecules (with the perception caches: benchmarks and tests measure cold runs). */
export function clearMoleculeCache(): void {
	molecules.clear();
}
