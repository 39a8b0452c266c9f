// Follows every free-group instance through the route, step by step towards the target, and finds
// the ones that a step attacks while they stand by: those are the needs a plan must mask.

import { mapAtoms, type AtomMap } from '../../chem/atom-map';
import { LruCache } from '../../chem/cache';
import { sharedMolecule } from '../../chem/molecule-cache';
import { mapAtomsByText } from '../../chem/text-atom-map';
import { perceiveText } from '../../chem/perception-cache';
import type { CheckRules } from '../check/types';
import { combinedMolecule } from '../check/transformation';
import { diolMemberPairs } from './diol-members';
import type { RouteTree } from './tree';
import type { Need } from './types';

/** A free group as the planner masks it; a diol carries its two alcohols as `members`. */
export type Unit = { id: string; atoms: number[]; members: string[] };

const DIOLS = ['diol-1,2', 'diol-1,3'];
const key = (atoms: number[]) => [...atoms].sort((a, b) => a - b).join(',');

/** The free units of a structure: a diol absorbs the alcohols inside it, e.g. `OCC(O)C` → one `diol-1,2`. */
export function freeUnits(structure: string): Unit[] {
	const { groups, protectingGroups } = perceiveText(structure);
	const covered = new Set(protectingGroups.flatMap((pg) => [...pg.atoms, ...pg.maskedAtoms]));
	const free = groups.filter((g) => !covered.has(g.key));
	const units: Unit[] = [];
	for (const diol of free.filter((g) => DIOLS.includes(g.id))) {
		if (units.some((u) => u.atoms.some((a) => diol.atoms.includes(a)))) {
			continue;
		}
		units.push({ id: diol.id, atoms: diol.atoms, members: [diol.id] });
	}
	for (const group of free.filter((g) => !DIOLS.includes(g.id))) {
		const diol = units.find(
			(u) => DIOLS.includes(u.id) && u.atoms.includes(group.key) && group.id.startsWith('alcohol')
		);
		if (diol) {
			diol.members.push(group.id);
		} else {
			units.push({ id: group.id, atoms: group.atoms, members: [group.id] });
		}
	}
	return units;
}

/**
 * Which product unit each substrate unit becomes (undefined: it reacts). As in the check, a group
 * id that keeps its count survives whole; the atom map (MCS, the slow part) only says which atoms
 * went where, and decides alone when some but not all instances of an id vanish. A convergent
 * step's substrates are read as one molecule, atoms numbered in the order of `substrates`.
 */
function follow(
	before: Unit[],
	after: Unit[],
	substrates: string[],
	product: string
): (number | undefined)[] {
	const cacheKey = `${substrates.join('\u0000')}\u0001${product}`;
	const stored = followed.get(cacheKey);
	if (stored) {
		return stored;
	}
	const count = (list: Unit[], id: string) => list.filter((u) => u.id === id).length;
	const ids = [...new Set(before.map((u) => u.id))];
	const mapped = ids.filter(
		(id) => count(after, id) > 0 && !(count(before, id) === 1 && count(after, id) === 1)
	);
	const substrate = () =>
		substrates.length === 1 ? sharedMolecule(substrates[0]!) : combinedMolecule(substrates);
	// The atoms both texts write alike, when they pair every unit that needs it; else the MCS.
	const byText = () =>
		substrates.length === 1
			? mapAtomsByText(
					substrates[0]!,
					product,
					substrate(),
					sharedMolecule(product),
					before.filter((u) => mapped.includes(u.id)).flatMap((u) => u.atoms)
				)
			: null;
	const map: AtomMap | null = mapped.length
		? (byText() ?? mapAtoms(substrate(), sharedMolecule(product)))
		: null;
	const result: (number | undefined)[] = before.map(() => undefined);
	const used = new Set<number>();
	before.forEach((unit, i) => {
		if (!map) {
			return;
		}
		const mapped = unit.atoms.map((a) => map.get(a));
		if (mapped.some((a) => a === undefined)) {
			return;
		}
		const index = after.findIndex(
			(u, j) => !used.has(j) && u.id === unit.id && key(u.atoms) === key(mapped as number[])
		);
		if (index >= 0) {
			result[i] = index;
			used.add(index);
		}
	});
	for (const id of ids) {
		if (count(after, id) < count(before, id)) {
			continue;
		}
		// Same count or more: every instance survives; pair the ones the map missed in order.
		before.forEach((unit, i) => {
			if (unit.id !== id || result[i] !== undefined) {
				return;
			}
			const index = after.findIndex((u, j) => !used.has(j) && u.id === id);
			if (index >= 0) {
				result[i] = index;
				used.add(index);
			}
		});
	}
	followed.set(cacheKey, result);
	return result;
}

// Routes are planned again after every edit: keep the (slow) mappings of unchanged steps.
const followed = new LruCache<(number | undefined)[]>('followedSteps');

/** Forgets cached step mappings (benchmarks, tests). */
export function clearFollowCache(): void {
	followed.clear();
}

/** The free units of a step's substrates as one list, atoms numbered as in `combinedMolecule`. */
function substrateUnits(
	tree: RouteTree,
	from: string[],
	units: Map<string, Unit[]>
): { unit: Unit; node: string; index: number }[] {
	let offset = 0;
	return from.flatMap((node) => {
		const shift = offset;
		if (from.length > 1) {
			offset += sharedMolecule(tree.byId.get(node)!.structure).getAllAtoms();
		}
		return units.get(node)!.map((unit, index) => ({
			unit: { ...unit, atoms: unit.atoms.map((a) => a + shift) },
			node,
			index
		}));
	});
}

/** The needs of a route: units a step attacks (`reacts`) while they stand by, e.g. a ketone through a Grignard step. */
export function findNeeds(tree: RouteTree, rules: CheckRules): Need[] {
	const units = new Map(tree.nodes.map((node) => [node.id, freeUnits(node.structure)]));
	type Track = { unit: Unit; path: string[]; atomsAt: Map<string, number[]>; end: string };
	const tracks: Track[] = [];
	// The track each unit of an intermediate continues, by intermediate id.
	const open = new Map<string, Track[]>();
	const track = (node: string, unit: Unit): Track => {
		const made: Track = {
			unit,
			path: [node],
			atomsAt: new Map([[node, unit.atoms]]),
			end: tree.target
		};
		tracks.push(made);
		return made;
	};
	for (const node of tree.nodes) {
		if (!tree.made.has(node.id)) {
			open.set(
				node.id,
				units.get(node.id)!.map((unit) => track(node.id, unit))
			);
		}
	}
	for (const step of tree.steps) {
		const before = substrateUnits(tree, step.from, units);
		const after = units.get(step.to)!;
		const substrates = step.from.map((id) => tree.byId.get(id)!.structure);
		const product = tree.byId.get(step.to)!.structure;
		const next = follow(
			before.map((b) => b.unit),
			after,
			substrates,
			product
		);
		const members = diolMemberPairs(
			before.map((b) => b.unit),
			after,
			next,
			substrates,
			product
		);
		const continued: (Track | undefined)[] = after.map(() => undefined);
		next.forEach((target, i) => {
			const followed = open.get(before[i]!.node)![before[i]!.index]!;
			const into = members.into.find((m) => m.before === i);
			if (into) {
				// It stands by the step and becomes one OH of a new diol: free again there.
				followed.path.push(step.to);
				followed.atomsAt.set(step.to, into.atoms);
				followed.end = step.to;
				return;
			}
			if (target === undefined || continued[target]) {
				followed.end = before[i]!.node;
				return;
			}
			followed.path.push(step.to);
			followed.atomsAt.set(step.to, after[target]!.atoms);
			continued[target] = followed;
		});
		// One OH of a substrate diol that stands by while the other reacts: its track starts at
		// the substrate, so the step counts as attacking it (a convergent step's atoms would need
		// unshifting, and diols rarely split there: those start at the product as before).
		if (step.from.length === 1) {
			for (const out of members.outOf) {
				const unit = after[out.after]!;
				const made = track(step.from[0]!, { id: unit.id, atoms: out.atoms, members: [unit.id] });
				made.path.push(step.to);
				made.atomsAt.set(step.to, unit.atoms);
				continued[out.after] = made;
			}
		}
		// Units the step makes (or that no substrate unit became) start their own tracks here.
		open.set(
			step.to,
			after.map((unit, i) => continued[i] ?? track(step.to, unit))
		);
	}
	const needs: Need[] = [];
	for (const track of tracks) {
		const end = track.path.indexOf(track.end);
		// How hard each step it stands by hits it: reacts, caution or not at all (judged by the
		// reagents that brought each class, as the check does).
		const hits = track.path.slice(0, end).map((node) => ({
			node,
			step: tree.next.get(node)!.id,
			...worstRating(rules, tree, tree.next.get(node)!.id, track.unit.members)
		}));
		// Masking is needed where a step reacts with it; where steps are only cautions, plans offer it.
		const level = hits.some((h) => h.rating === 'reacts') ? 'reacts' : 'caution';
		const attacks = hits.filter((h) => h.rating === level);
		if (attacks.length === 0) {
			continue;
		}
		const last = track.path.indexOf(attacks.at(-1)!.node);
		needs.push({
			group: track.unit.id,
			members: track.unit.members,
			atoms: track.unit.atoms,
			path: track.path.slice(0, end + 1),
			atomsAt: track.atomsAt,
			installAt: attacks[0]!.node,
			freeAt: track.end,
			removableFrom: track.path[last + 1]!,
			attackedAt: attacks.map((h) => h.step),
			level,
			usuallyMasked: attacks.some((h) => h.usuallyMasked)
		});
	}
	return needs;
}

/**
 * The worst rating a step's conditions give any of a unit's groups, e.g. MeMgBr on a ketone →
 * `reacts`; a caution that chemists usually mask for (a free amine in a Swern oxidation) says so.
 */
function worstRating(rules: CheckRules, tree: RouteTree, stepId: string, members: string[]) {
	let worst: 'reacts' | 'caution' | null = null;
	let usuallyMasked = false;
	for (const c of tree.conditions.get(stepId)!) {
		for (const group of members) {
			const rule = rules.reactivity(group, c.id, c.reagents);
			if (rule?.rating === 'reacts') {
				return { rating: rule.rating, usuallyMasked: false };
			}
			if (rule?.rating === 'caution') {
				worst = rule.rating;
				usuallyMasked ||= rule.usuallyMasked === true;
			}
		}
	}
	return { rating: worst, usuallyMasked };
}
