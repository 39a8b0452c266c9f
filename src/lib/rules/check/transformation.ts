// What a step does to its substrate, independent of its conditions: which protecting groups
// and free groups survive unchanged into the product (bystanders) and which change (the
// intended reaction sites). Cached by structure text, since a route is re-checked on every edit.

import { Molecule } from 'openchemlib';
import { mapAtoms, type AtomMap } from '../../chem/atom-map';
import { LruCache } from '../../chem/cache';
import { sharedMolecule } from '../../chem/molecule-cache';
import { perceive, type Perception } from '../../chem/perceive';
import { perceiveText } from '../../chem/perception-cache';
import type { PgSite } from '../ids';
import { siteOf } from './pg-site';

/**
 * `on`: what a protecting group sits on, where that matters to its ratings (pg-site.ts).
 * `twinOfConverted`: a surviving free group that is symmetry-equivalent to one the step converts
 * (the other alcohol of a symmetric diol), so no reagent can tell the two apart.
 */
export type Site = {
	id: string;
	atoms: number[];
	survives: boolean;
	on?: PgSite;
	twinOfConverted?: boolean;
};
export type Transformation = { protectingGroups: Site[]; freeGroups: Site[]; mapped: boolean };

const cache = new LruCache<Transformation>('transformations');

/** Joins several substrate texts into one new molecule; atom indices follow the order given. */
export function combinedMolecule(texts: string[]): Molecule {
	const [first, ...rest] = texts.map(sharedMolecule);
	const combined = first!.getCompactCopy();
	for (const other of rest) {
		combined.addMolecule(other);
	}
	return combined;
}

/** Survival of every PG and free group of the substrate, e.g. a ketone left by a Grignard on an ester survives. */
export function transformation(substrates: string[], product: string): Transformation {
	const key = `${substrates.join('\u0000')}\u0001${product}`;
	const stored = cache.get(key);
	if (stored) {
		return stored;
	}
	// The intermediates of a route recur as substrate and product, so perceive and read molecules
	// through the text caches.
	const combined = substrates.length === 1 ? null : combinedMolecule(substrates);
	const before = combined ? perceive(combined) : perceiveText(substrates[0]!);
	const after = perceiveText(product);
	// Counting decides most steps: a group id that keeps its count survives, one that vanishes
	// changed. Only when some but not all instances of an id vanish must the atoms be mapped
	// (the maximum common substructure is the slow part) to tell which one reacted.
	const substrateMolecule = () => combined ?? sharedMolecule(substrates[0]!);
	const map = ambiguous(before, after)
		? mapAtoms(substrateMolecule(), sharedMolecule(product))
		: null;
	const result = compare(before, after, map);
	if (map) {
		markTwins(result.freeGroups, substrateMolecule());
	}
	if (result.protectingGroups.length) {
		const molecule = substrateMolecule();
		before.protectingGroups.forEach((pg, i) => {
			const on = siteOf(molecule, pg.maskedAtom);
			if (on) {
				result.protectingGroups[i]!.on = on;
			}
		});
	}
	cache.set(key, result);
	return result;
}

function ambiguous(before: Perception, after: Perception): boolean {
	const counts = (sites: { id: string }[]) => {
		const tally = new Map<string, number>();
		for (const site of sites) {
			tally.set(site.id, (tally.get(site.id) ?? 0) + 1);
		}
		return tally;
	};
	const pairs: [Map<string, number>, Map<string, number>][] = [
		[counts(before.protectingGroups), counts(after.protectingGroups)],
		[counts(before.groups), counts(after.groups)]
	];
	return pairs.some(([was, now]) =>
		[...was].some(([id, n]) => (now.get(id) ?? 0) > 0 && (now.get(id) ?? 0) < n)
	);
}

function compare(before: Perception, after: Perception, map: AtomMap | null): Transformation {
	// A group whose key atom sits inside a protecting group is masked, not free.
	const covered = new Set(
		before.protectingGroups.flatMap((pg) => [...pg.atoms, ...pg.maskedAtoms])
	);
	const free = before.groups.filter((g) => !covered.has(g.key));
	const survives = (
		id: string,
		atoms: number[],
		productSites: { id: string; atoms: number[] }[],
		countBefore: number
	) => {
		if (!map) {
			return productSites.filter((s) => s.id === id).length >= countBefore;
		}
		const mapped = atoms.map((a) => map.get(a));
		if (mapped.some((a) => a === undefined)) {
			return false;
		}
		const wanted = [...(mapped as number[])].sort((a, b) => a - b).join(',');
		return productSites.some(
			(s) => s.id === id && [...s.atoms].sort((a, b) => a - b).join(',') === wanted
		);
	};
	const count = (sites: { id: string }[], id: string) => sites.filter((s) => s.id === id).length;
	return {
		mapped: map !== null,
		protectingGroups: before.protectingGroups.map((pg) => ({
			id: pg.id,
			atoms: pg.atoms,
			survives: survives(
				pg.id,
				pg.atoms,
				after.protectingGroups,
				count(before.protectingGroups, pg.id)
			)
		})),
		freeGroups: free.map((g) => ({
			id: g.id,
			atoms: g.atoms,
			survives: survives(g.id, g.atoms, after.groups, count(free, g.id))
		}))
	};
}

/**
 * Marks each surviving free group whose atoms have the same symmetry ranks as a converted group
 * of the same id: the two are the same site as far as any reagent can tell, e.g. the two
 * alcohols of butane-1,4-diol, one of which a mono-silylation converts.
 */
function markTwins(groups: Site[], substrate: Molecule): void {
	const converted = groups.filter((g) => !g.survives);
	const standing = groups.filter((g) => g.survives && converted.some((c) => c.id === g.id));
	if (standing.length === 0) {
		return;
	}
	// A copy: the shared molecule is read by other callers, and ranks are helper state.
	const molecule = substrate.getCompactCopy();
	molecule.ensureHelperArrays(Molecule.cHelperSymmetrySimple);
	const ranks = (atoms: number[]) =>
		atoms
			.map((a) => molecule.getSymmetryRank(a))
			.sort((a, b) => a - b)
			.join(',');
	for (const group of standing) {
		const mine = ranks(group.atoms);
		if (converted.some((c) => c.id === group.id && ranks(c.atoms) === mine)) {
			group.twinOfConverted = true;
		}
	}
}

export function clearTransformationCache(): void {
	cache.clear();
}
