// Draws protected intermediates: each PG's install transform (a reaction SMARTS from
// rules/protecting-groups.json) applied on the atoms of the group it masks. Building from the
// unprotected structure every time also gives the regenerated free group after a removal, with no
// bookkeeping of deleted atoms.
//
// A SMILES is edited as text (chem/smiles-splice.ts): no coordinates, no canonical SMILES, the
// chemist's own writing and stereo marks kept; about 0.1 ms where openchemlib's Reactor and a
// canonical SMILES took ~50 ms for a 130-atom product, which was most of first sight of a route.
// A molfile, or a transform the splicer does not handle, goes through the Reactor as before.

import { LruCache } from '../../chem/cache';
import { detectFormat } from '../../chem/format';
import { sharedMolecule } from '../../chem/molecule-cache';
import { readStructure } from '../../chem/parse';
import { spliceTransforms, SpliceUnsupported } from '../../chem/smiles-splice';
import { applyTransforms, type SiteTransform } from '../../chem/transform';

/** One PG on one free group: its install transform and the group's atoms in this structure. */
export type Mask = { pg: string; transform: string; atoms: number[] };

/** The structure with each mask drawn on, as SMILES, e.g. TBS on the alcohol of `OCCCC=O` → `O([Si](C)(C)C(C)(C)C)CCCC=O`. */
export function protectedStructure(structure: string, masks: Mask[]): string {
	if (masks.length === 0) {
		return structure;
	}
	const cacheKey = `${structure}\u0001${masks.map((m) => `${m.transform}@${m.atoms.join(',')}`).join(';')}`;
	const stored = drawn.get(cacheKey);
	if (stored) {
		return stored;
	}
	const transforms = masks.map((m) => ({ smarts: m.transform, atoms: m.atoms }));
	const smiles = drawnBySplice(structure, transforms) ?? drawnByReactor(structure, transforms);
	drawn.set(cacheKey, smiles);
	return smiles;
}

/** The SMILES edited in place, or null for a molfile or a transform the splicer leaves to the Reactor. */
function drawnBySplice(structure: string, transforms: SiteTransform[]): string | null {
	if (detectFormat(structure) !== 'smiles') {
		return null;
	}
	// As readStructure reads it: a title after the SMILES is dropped.
	const smiles = structure.trim().split(/\s+/)[0]!;
	try {
		return spliceTransforms(smiles, sharedMolecule(structure), transforms);
	} catch (caught) {
		if (caught instanceof SpliceUnsupported) {
			return null;
		}
		throw caught;
	}
}

/** The Reactor's product as canonical isomeric SMILES (the path before the splicer; tests compare both). */
export function drawnByReactor(structure: string, transforms: SiteTransform[]): string {
	// Stereo costs the Reactor more than half its time; a SMILES with no @, / or \ has none to keep
	// (a newline means a molfile, which may carry stereo in its coordinates and wedges).
	const stereo = /[@/\\\n]/.test(structure);
	const molecule = readStructure(structure, { stereo, warnings: false }).molecule;
	return applyTransforms(molecule, transforms).toIsomericSmiles();
}

// The ranked plans share most of their protected intermediates; draw each one once.
const drawn = new LruCache<string>('drawnStructures');

/** Forgets drawn structures (benchmarks, tests). */
export function clearDrawCache(): void {
	drawn.clear();
}
