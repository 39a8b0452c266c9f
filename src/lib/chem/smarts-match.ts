// Every mapping of an exact query (smarts-query.ts) onto a molecule's atom table, in plain
// TypeScript. openchemlib's substructure search costs 20–300 µs a call even on small molecules
// (most of it emulated 64-bit arithmetic and the garbage it leaves), while this walk over typed
// arrays costs a few µs, so perception searches here and keeps openchemlib for parsing, rings
// and aromaticity. tests/unit/chem-smarts-match.test.ts proves both list the same mappings.

import type { AtomTable } from './prefilter';
import { AROMATIC, type AtomTest, type ExactQuery } from './smarts-query';

/** Recursive `$()` results per table and query: -1 not yet known, 0 no, 1 yes. */
const recursiveResults = new WeakMap<AtomTable, Map<ExactQuery, Int8Array>>();

/**
 * Every mapping (query atom → molecule atom), symmetric ones included, in ascending order of the
 * mapping arrays, e.g. `allMappings(atomTable(mol), exactQuery('[OX2H]C')!)` → `[[2, 1]]`.
 */
export function allMappings(table: AtomTable, query: ExactQuery): number[][] {
	const found: number[][] = [];
	const placed = new Int32Array(query.atoms.length).fill(-1);
	const used = new Uint8Array(table.element.length);
	for (let atom = 0; atom < table.element.length; atom++) {
		if (query.firstElement !== null && table.element[atom] !== query.firstElement) continue;
		place(table, query, placed, used, 0, atom, found, false);
	}
	return found.sort(compareMappings);
}

/** Ascending by first atom, then second, …: one order for this walk and openchemlib alike. */
export function compareMappings(a: readonly number[], b: readonly number[]): number {
	for (let i = 0; i < a.length && i < b.length; i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
	return a.length - b.length;
}

/** Whether the query matches with its first atom on `atom` (how `$()` is read). */
function matchesAt(table: AtomTable, query: ExactQuery, atom: number): boolean {
	let results = recursiveResults.get(table);
	if (!results) recursiveResults.set(table, (results = new Map()));
	let known = results.get(query);
	if (!known) results.set(query, (known = new Int8Array(table.element.length).fill(-1)));
	if (known[atom] === -1) {
		const placed = new Int32Array(query.atoms.length).fill(-1);
		const used = new Uint8Array(table.element.length);
		known[atom] = place(table, query, placed, used, 0, atom, [], true) ? 1 : 0;
	}
	return known[atom] === 1;
}

/**
 * Puts query atom `index` on molecule atom `atom` and, if it fits, goes on with the next one;
 * a complete mapping is collected (or, with `firstOnly`, ends the search with true).
 */
function place(table: AtomTable, query: ExactQuery, placed: Int32Array, used: Uint8Array, index: number, atom: number, found: number[][], firstOnly: boolean): boolean {
	if (used[atom] || !fits(table, atom, query.atoms[index]!)) return false;
	for (const { other, bond } of query.closures[index]!) if (!bonded(table, atom, placed[other]!, bond)) return false;
	placed[index] = atom;
	const next = index + 1;
	if (next === query.atoms.length) {
		if (firstOnly) return true;
		found.push(Array.from(placed));
		placed[index] = -1;
		return false;
	}
	used[atom] = 1;
	const from = placed[query.parent[next]!]!;
	const neighbours = table.neighbours[from]!;
	const bonds = table.bonds[from]!;
	const mask = query.parentBond[next]!;
	let done = false;
	for (let i = 0; i < neighbours.length && !done; i++) {
		if (bondFits(bonds[i]!, mask)) done = place(table, query, placed, used, next, neighbours[i]!, found, firstOnly);
	}
	used[atom] = 0;
	placed[index] = -1;
	return done;
}

/** An aromatic bond meets only queries that allow aromatic; any other bond needs its order bit. */
function bondFits(bits: number, mask: number): boolean {
	return bits & AROMATIC ? (mask & AROMATIC) !== 0 : (bits & mask) !== 0;
}

function bonded(table: AtomTable, a: number, b: number, mask: number): boolean {
	const i = table.neighbours[a]!.indexOf(b);
	return i >= 0 && bondFits(table.bonds[a]![i]!, mask);
}

function fits(table: AtomTable, atom: number, test: AtomTest): boolean {
	switch (test.kind) {
		case 'all':
			return test.tests.every((part) => fits(table, atom, part));
		case 'any':
			return test.tests.some((part) => fits(table, atom, part));
		case 'not':
			return !fits(table, atom, test.test);
		case 'element':
			return table.element[atom] === test.element;
		case 'aromatic':
			return (table.aromatic[atom] === 1) === test.aromatic;
		case 'hydrogens':
			return table.hydrogens[atom] === test.count;
		case 'connections':
			return table.neighbours[atom]!.length + table.hydrogens[atom]! === test.count;
		case 'charge':
			return table.charge[atom] === test.charge;
		case 'recursive':
			return matchesAt(table, test.query, atom);
	}
}
