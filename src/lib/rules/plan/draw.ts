// Draws protected intermediates: each PG's install transform (a reaction SMARTS from
// rules/protecting-groups.json) run with openchemlib's Reactor on the atoms of the group it masks.
// Building from the unprotected structure every time also gives the regenerated free group after
// a removal, with no bookkeeping of deleted atoms.

import { LruCache } from '../../chem/cache';
import { readStructure } from '../../chem/parse';
import { applyTransforms } from '../../chem/transform';

/** One PG on one free group: its install transform and the group's atoms in this structure. */
export type Mask = { pg: string; transform: string; atoms: number[] };

/** The structure with each mask drawn on, as SMILES, e.g. TBS on the alcohol of `OCCCC=O` → `CC(C)(C)[Si](C)(C)OCCCC=O`. */
export function protectedStructure(structure: string, masks: Mask[]): string {
	if (masks.length === 0) return structure;
	const cacheKey = `${structure}\u0001${masks.map((m) => `${m.transform}@${m.atoms.join(',')}`).join(';')}`;
	const stored = drawn.get(cacheKey);
	if (stored) return stored;
	// Stereo costs the Reactor more than half its time; a SMILES with no @, / or \ has none to keep
	// (a newline means a molfile, which may carry stereo in its coordinates and wedges).
	const stereo = /[@/\\\n]/.test(structure);
	const molecule = readStructure(structure, { stereo, warnings: false }).molecule;
	const smiles = applyTransforms(
		molecule,
		masks.map((m) => ({ smarts: m.transform, atoms: m.atoms }))
	).toIsomericSmiles();
	drawn.set(cacheKey, smiles);
	return smiles;
}

// The ranked plans share most of their protected intermediates; draw each one once.
const drawn = new LruCache<string>('drawnStructures');

/** Forgets drawn structures (benchmarks, tests). */
export function clearDrawCache(): void {
	drawn.clear();
}
