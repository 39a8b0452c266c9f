// Perception results kept for reuse. Two keys, two uses:
//   - the canonical key (ID code), where it is computed anyway (the API returns it): the same
//     molecule written another way hits, and atom indices are translated through the canonical
//     numbering, so each caller gets indices of its own input;
//   - the text, for callers that re-perceive the same intermediates again and again (the route
//     map re-checks every structure on each edit): a hit costs a digest and a lookup, no parse.
// Both are keyed by a SHA-256 digest and bounded by bytes (cache.ts, CACHE_BYTES).

import type { Molecule } from 'openchemlib';
import { LruCache } from './cache';
import { clearMoleculeCache, sharedMolecule } from './molecule-cache';
import { perceive, type Perception } from './perceive';
import type { CanonicalForm } from './properties';

const byCanonicalKey = new LruCache<Perception>('perceptionByKey');
const byText = new LruCache<Perception>('perceptionByText');

/** Perception via the canonical-key cache, e.g. `perceiveWithKey(mol, canonicalForm(mol))`. */
export function perceiveWithKey(molecule: Molecule, form: CanonicalForm): Perception {
	const stored = byCanonicalKey.get(form.key);
	if (stored) {
		return renumber(stored, form.fromCanonical);
	}
	const fresh = perceive(molecule);
	byCanonicalKey.set(form.key, renumber(fresh, form.toCanonical));
	return fresh;
}

/** Perception of structure text via the text cache (parsed without coordinates), e.g. `perceiveText('OCCO')`. */
export function perceiveText(text: string): Perception {
	// Warnings are not part of a perception, and collecting them costs more than perceiving.
	return byText.getOrSet(text, () => perceive(sharedMolecule(text)));
}

/** Entries and bytes held by the two caches (tests and benchmarks), e.g. `perceptionCacheUse().byText.bytes`. */
export function perceptionCacheUse() {
	return {
		byText: { entries: byText.size, bytes: byText.bytes },
		byKey: { entries: byCanonicalKey.size, bytes: byCanonicalKey.bytes }
	};
}

/** Empties both caches and the parsed molecules (tests and benchmarks measure cold runs with it), e.g. `clearPerceptionCache()`. */
export function clearPerceptionCache(): void {
	byCanonicalKey.clear();
	byText.clear();
	clearMoleculeCache();
}

function renumber(perception: Perception, map: number[]): Perception {
	const to = (atom: number) => map[atom]!;
	const sorted = (atoms: number[]) => atoms.map(to).sort((a, b) => a - b);
	return {
		groups: perception.groups.map((g) => ({ id: g.id, atoms: sorted(g.atoms), key: to(g.key) })),
		protectingGroups: perception.protectingGroups.map((pg) => ({
			id: pg.id,
			atoms: sorted(pg.atoms),
			masks: pg.masks,
			maskedAtom: to(pg.maskedAtom),
			maskedAtoms: pg.maskedAtoms.map(to)
		}))
	};
}
