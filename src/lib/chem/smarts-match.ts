// Every mapping of an exact query (smarts-query.ts) onto a molecule's atom table, in plain
// TypeScript. openchemlib's substructure search costs 20–300 µs a call even on small molecules
// (most of it emulated 64-bit arithmetic and the garbage it leaves), while this walk over typed
// arrays costs a few µs, so perception searches here and keeps openchemlib for parsing, rings
// and aromaticity. tests/unit/chem-smarts-match.test.ts proves both list the same mappings.

import type { AtomTable } from './prefilter';
import { AROMATIC, type AtomTest, type ExactQuery } from './smarts-query';
import { leafOrder, queryElements, searchPlan, type SearchPlan } from './smarts-plan';

/** Recursive `$()` results per table and query: -1 not yet known, 0 no, 1 yes. */
const recursiveResults = new WeakMap<AtomTable, Map<ExactQuery, Int8Array>>();

/** Atoms by element, per table, made on first use. */
const atomsByElement = new WeakMap<AtomTable, Map<number, number[]>>();

function atomsOf(table: AtomTable, element: number): readonly number[] {
	let index = atomsByElement.get(table);
	if (!index) {
		index = new Map();
		for (let atom = 0; atom < table.element.length; atom++) {
			const list = index.get(table.element[atom]!);
			if (list) {
				list.push(atom);
			} else {
				index.set(table.element[atom]!, [atom]);
			}
		}
		atomsByElement.set(table, index);
	}
	return index.get(element) ?? [];
}

/** One search in progress: the plan it follows, where each query atom sits, which atoms are taken. */
type Search = {
	table: AtomTable;
	query: ExactQuery;
	plan: SearchPlan;
	placed: Int32Array;
	used: Uint8Array;
	found: number[][];
	firstOnly: boolean;
	/** Interchangeable leaves kept in ascending order only (null: every permutation listed). */
	leaves: { before: Int32Array; after: Int32Array } | null;
};

/** Working arrays per query, reused: a search leaves them clean (every step undoes itself). */
const scratch = new WeakMap<ExactQuery, { placed: Int32Array; used: Uint8Array }>();
/** Those a search on a table with odd atoms used: cleaned if it stops half way (OddAtom). */
const touched = new Set<{ placed: Int32Array; used: Uint8Array }>();

function startSearch(
	table: AtomTable,
	query: ExactQuery,
	root: number,
	firstOnly: boolean,
	distinct: boolean
): Search {
	let arrays = scratch.get(query);
	if (!arrays || arrays.used.length < table.element.length) {
		arrays = {
			placed: new Int32Array(query.atoms.length).fill(-1),
			used: new Uint8Array(Math.max(64, table.element.length))
		};
		scratch.set(query, arrays);
	}
	if (!table.plain) {
		touched.add(arrays);
	}
	const leaves = distinct ? leafOrder(query) : null;
	return { table, query, plan: searchPlan(query, root), ...arrays, found: [], firstOnly, leaves };
}

/**
 * Every mapping (query atom → molecule atom), symmetric ones included, in ascending order of the
 * mapping arrays, e.g. `allMappings(atomTable(mol), exactQuery('[OX2H]C')!)` → `[[2, 1]]`.
 */
export function allMappings(table: AtomTable, query: ExactQuery): number[][] {
	return search(table, query, false);
}

/**
 * The first mapping of each distinct atom set, ascending: what perception uses, e.g.
 * `distinctMatches(table, tbsQuery)` → one mapping per TBS ether where allMappings lists 12.
 * Null when the search would test X or H on an odd atom (AtomTable.odd): openchemlib decides.
 */
export function distinctMatches(table: AtomTable, query: ExactQuery): number[][] | null {
	try {
		const found = firstPerAtomSet(search(table, query, true));
		touched.clear();
		return found;
	} catch (caught) {
		if (!(caught instanceof OddAtom)) {
			throw caught;
		}
		// The search stopped half way: its working arrays must be clean for the next one.
		for (const arrays of touched) {
			arrays.placed.fill(-1);
			arrays.used.fill(0);
		}
		touched.clear();
		return null;
	}
}

/** Thrown where X or H would be tested on an odd atom. */
class OddAtom extends Error {}

function search(table: AtomTable, query: ExactQuery, distinct: boolean): number[][] {
	// Start on the query atom with the fewest candidates here; none at all ends the search.
	const elements = queryElements(query);
	let root = 0;
	let fewest = Infinity;
	for (let atom = 0; atom < elements.length; atom++) {
		const set = elements[atom];
		if (!set) {
			continue;
		}
		let candidates = 0;
		for (const element of set) {
			candidates += atomsOf(table, element).length;
		}
		if (candidates === 0) {
			return [];
		}
		if (candidates < fewest) {
			[root, fewest] = [atom, candidates];
		}
	}
	const search = startSearch(table, query, root, false, distinct);
	const set = elements[root];
	if (set) {
		for (const element of set) {
			for (const atom of atomsOf(table, element)) {
				place(search, 0, atom);
			}
		}
	} else {
		for (let atom = 0; atom < table.element.length; atom++) {
			place(search, 0, atom);
		}
	}
	return search.found.length > 1 ? search.found.sort(compareMappings) : search.found;
}

/** The first mapping of each distinct atom set, in the order given, e.g. `firstPerAtomSet([[1, 2], [2, 1]])` → `[[1, 2]]`. */
export function firstPerAtomSet(mappings: number[][]): number[][] {
	if (mappings.length < 2) {
		return mappings;
	}
	const seen = new Set<string>();
	return mappings.filter((mapping) => {
		const atomSet = matchedAtoms(mapping).join(',');
		if (seen.has(atomSet)) {
			return false;
		}
		seen.add(atomSet);
		return true;
	});
}

/** The molecule atoms of a match, without excluded placeholders, sorted, e.g. `matchedAtoms([5, -1, 2])` → `[2, 5]`. */
export function matchedAtoms(match: number[]): number[] {
	return match.filter((atom) => atom >= 0).sort((a, b) => a - b);
}

/** Ascending by first atom, then second, …: one order for this walk and openchemlib alike. */
export function compareMappings(a: readonly number[], b: readonly number[]): number {
	for (let i = 0; i < a.length && i < b.length; i++) {
		if (a[i] !== b[i]) {
			return a[i]! - b[i]!;
		}
	}
	return a.length - b.length;
}

/** Whether the query matches with its first atom on `atom` (how `$()` is read). */
function matchesAt(table: AtomTable, query: ExactQuery, atom: number): boolean {
	let results = recursiveResults.get(table);
	if (!results) {
		recursiveResults.set(table, (results = new Map()));
	}
	let known = results.get(query);
	if (!known) {
		results.set(query, (known = new Int8Array(table.element.length).fill(-1)));
	}
	if (known[atom] === -1) {
		known[atom] = place(startSearch(table, query, 0, true, true), 0, atom) ? 1 : 0;
	}
	return known[atom] === 1;
}

/**
 * Puts the query atom of plan step `step` on molecule atom `atom` and, if it fits, goes on with
 * the next step; a complete mapping is collected (or, with `firstOnly`, ends the search: true).
 */
function place(search: Search, step: number, atom: number): boolean {
	const { table, query, plan, placed, used } = search;
	const queryAtom = plan.order[step]!;
	if (used[atom] || !fits(table, atom, query.atoms[queryAtom]!)) {
		return false;
	}
	if (search.leaves) {
		const before = search.leaves.before[queryAtom]!;
		const after = search.leaves.after[queryAtom]!;
		if (
			(before >= 0 && placed[before]! > atom) ||
			(after >= 0 && placed[after]! >= 0 && placed[after]! < atom)
		) {
			return false;
		}
	}
	for (const { other, bond } of plan.back[step]!) {
		if (!bonded(table, atom, placed[other]!, bond)) {
			return false;
		}
	}
	placed[queryAtom] = atom;
	const next = step + 1;
	if (next === plan.order.length) {
		if (!search.firstOnly) {
			search.found.push(Array.from(placed));
		}
		placed[queryAtom] = -1;
		return search.firstOnly;
	}
	used[atom] = 1;
	const from = placed[plan.from[next]!]!;
	const neighbours = table.neighbours[from]!;
	const bonds = table.bonds[from]!;
	const mask = plan.bond[next]!;
	let done = false;
	for (let i = 0; i < neighbours.length && !done; i++) {
		if (bondFits(bonds[i]!, mask)) {
			done = place(search, next, neighbours[i]!);
		}
	}
	used[atom] = 0;
	placed[queryAtom] = -1;
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
			for (const part of test.tests) {
				if (!fits(table, atom, part)) {
					return false;
				}
			}
			return true;
		case 'any':
			for (const part of test.tests) {
				if (fits(table, atom, part)) {
					return true;
				}
			}
			return false;
		case 'not':
			return !fits(table, atom, test.test);
		case 'element':
			return table.element[atom] === test.element;
		case 'aromatic':
			return (table.aromatic[atom] === 1) === test.aromatic;
		case 'hydrogens':
			if (table.odd[atom]) {
				throw new OddAtom();
			}
			return table.hydrogens[atom] === test.count;
		case 'connections':
			if (table.odd[atom]) {
				throw new OddAtom();
			}
			return table.neighbours[atom]!.length + table.hydrogens[atom]! === test.count;
		case 'degree': {
			const connections = table.neighbours[atom]!.length;
			return test.atLeast ? connections >= test.count : connections === test.count;
		}
		case 'ringSize':
			return table.ringSize[atom] === test.size;
		case 'charge':
			return table.charge[atom] === test.charge;
		case 'recursive':
			return matchesAt(table, test.query, atom);
	}
}
