// Follows every free-group instance along the line of intermediates and finds the ones that a
// step attacks while they stand by: those are the needs a plan must mask.

import { mapAtoms, type AtomMap } from '../../chem/atom-map';
import { LruCache } from '../../chem/cache';
import { readStructure } from '../../chem/parse';
import { perceiveText } from '../../chem/perception-cache';
import type { CheckRules } from '../check/types';
import type { Chain } from './chain';
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
		if (units.some((u) => u.atoms.some((a) => diol.atoms.includes(a)))) continue;
		units.push({ id: diol.id, atoms: diol.atoms, members: [diol.id] });
	}
	for (const group of free.filter((g) => !DIOLS.includes(g.id))) {
		const diol = units.find((u) => DIOLS.includes(u.id) && u.atoms.includes(group.key) && group.id.startsWith('alcohol'));
		if (diol) diol.members.push(group.id);
		else units.push({ id: group.id, atoms: group.atoms, members: [group.id] });
	}
	return units;
}

/**
 * Which product unit each substrate unit becomes (undefined: it reacts). As in the check, a group
 * id that keeps its count survives whole; the atom map (MCS, the slow part) only says which atoms
 * went where, and decides alone when some but not all instances of an id vanish.
 */
function follow(before: Unit[], after: Unit[], substrate: string, product: string): (number | undefined)[] {
	const cacheKey = `${substrate}\u0001${product}`;
	const stored = followed.get(cacheKey);
	if (stored) return stored;
	const count = (list: Unit[], id: string) => list.filter((u) => u.id === id).length;
	const ids = [...new Set(before.map((u) => u.id))];
	const needsMap = ids.some((id) => count(after, id) > 0 && !(count(before, id) === 1 && count(after, id) === 1));
	const map: AtomMap | null = needsMap ? mapAtoms(readStructure(substrate).molecule, readStructure(product).molecule) : null;
	const result: (number | undefined)[] = before.map(() => undefined);
	const used = new Set<number>();
	before.forEach((unit, i) => {
		if (!map) return;
		const mapped = unit.atoms.map((a) => map.get(a));
		if (mapped.some((a) => a === undefined)) return;
		const index = after.findIndex((u, j) => !used.has(j) && u.id === unit.id && key(u.atoms) === key(mapped as number[]));
		if (index >= 0) {
			result[i] = index;
			used.add(index);
		}
	});
	for (const id of ids) {
		if (count(after, id) < count(before, id)) continue;
		// Same count or more: every instance survives; pair the ones the map missed in order.
		before.forEach((unit, i) => {
			if (unit.id !== id || result[i] !== undefined) return;
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
const followed = new LruCache<string, (number | undefined)[]>(500);

/** Forgets cached step mappings (benchmarks, tests). */
export function clearFollowCache(): void {
	followed.clear();
}

/** The needs of a route: units a step attacks (`reacts`) while they stand by, e.g. a ketone through a Grignard step. */
export function findNeeds(chain: Chain, rules: CheckRules): Need[] {
	const units = chain.nodes.map((node) => freeUnits(node.structure));
	type Track = { unit: Unit; born: number; atomsAt: Map<number, number[]>; end: number; last: number };
	const tracks: Track[] = [];
	let open: (Track | undefined)[] = units[0]!.map((unit) => ({ unit, born: 0, atomsAt: new Map([[0, unit.atoms]]), end: chain.steps.length, last: 0 }));
	tracks.push(...(open as Track[]));
	chain.steps.forEach((_, i) => {
		const next = follow(units[i]!, units[i + 1]!, chain.nodes[i]!.structure, chain.nodes[i + 1]!.structure);
		const nextOpen: (Track | undefined)[] = units[i + 1]!.map(() => undefined);
		next.forEach((target, from) => {
			const track = open[from];
			if (!track) return;
			if (target === undefined || nextOpen[target]) track.end = Math.min(track.end, i);
			else {
				track.atomsAt.set(i + 1, units[i + 1]![target]!.atoms);
				track.last = i + 1;
				nextOpen[target] = track;
			}
		});
		units[i + 1]!.forEach((unit, index) => {
			if (nextOpen[index]) return;
			const born: Track = { unit, born: i + 1, atomsAt: new Map([[i + 1, unit.atoms]]), end: chain.steps.length, last: i + 1 };
			nextOpen[index] = born;
			tracks.push(born);
		});
		open = nextOpen;
	});
	const needs: Need[] = [];
	for (const track of tracks) {
		const attackedAt: number[] = [];
		for (let step = track.born; step < track.end; step++) {
			const hit = chain.conditions[step]!.some((c) => track.unit.members.some((g) => rules.reactivity(g, c.id)?.rating === 'reacts'));
			if (hit) attackedAt.push(step);
		}
		if (attackedAt.length === 0) continue;
		needs.push({
			group: track.unit.id,
			atoms: track.unit.atoms,
			born: track.born,
			atomsAt: track.atomsAt,
			installGap: attackedAt[0]!,
			freeGap: track.end,
			attackedAt
		});
	}
	return needs;
}
