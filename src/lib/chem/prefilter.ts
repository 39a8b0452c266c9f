// The atom table every TypeScript search reads, and a loose substructure test run before
// openchemlib's search (which is now used only for patterns or molecules smarts-match.ts leaves
// to it: see match.ts).
//
// One openchemlib search costs tens of µs even when it finds nothing, and most pattern × molecule
// pairs find nothing. This test reads the pattern's SMARTS itself and walks the atom table in a
// few µs. It is deliberately looser than openchemlib: anything it does not understand (recursive
// `$()`, negations, charges, ring primitives) counts as "may match", bonds accept aromatic as
// well, and `X<n>` only caps the heavy-atom neighbours. So "no" is final and "yes" still goes to
// openchemlib for the real match list. tests/unit/chem-prefilter.test.ts proves "no" never hides
// a match over the reference set.
import type { AtomTable } from './atom-table';
import type { AtomSpec, LooseQuery } from './loose-query';

// The atom table and the loose reader live in their own files; callers keep importing them here.
export { atomTable, type AtomTable } from './atom-table';
export { looseQuery, type LooseQuery } from './loose-query';

/** Whether the query can possibly match; false means openchemlib would find nothing, e.g. `mayMatch(table, looseQuery('[OX2H]c')!)`. */
export function mayMatch(table: AtomTable, query: LooseQuery): boolean {
	const placed = new Int32Array(query.atoms.length).fill(-1);
	const used = new Uint8Array(table.element.length);
	for (let atom = 0; atom < table.element.length; atom++) {
		if (tryAtom(table, query, placed, used, 0, atom)) {
			return true;
		}
	}
	return false;
}

/** Puts pattern atom `index` on molecule atom `atom` and, if it fits, goes on with the next one. */
function tryAtom(
	table: AtomTable,
	query: LooseQuery,
	placed: Int32Array,
	used: Uint8Array,
	index: number,
	atom: number
): boolean {
	if (used[atom] || !fits(table, atom, query.atoms[index]!)) {
		return false;
	}
	for (const { other, bond } of query.closures[index]!) {
		if (!bonded(table, atom, placed[other]!, bond)) {
			return false;
		}
	}
	const next = index + 1;
	if (next === query.atoms.length) {
		return true;
	}
	placed[index] = atom;
	used[atom] = 1;
	const from = placed[query.parent[next]!]!;
	const neighbours = table.neighbours[from]!;
	const bonds = table.bonds[from]!;
	const mask = query.parentBond[next]!;
	for (let i = 0; i < neighbours.length; i++) {
		if (bonds[i]! & mask && tryAtom(table, query, placed, used, next, neighbours[i]!)) {
			return true;
		}
	}
	used[atom] = 0;
	return false;
}

function fits(table: AtomTable, atom: number, spec: AtomSpec): boolean {
	if (spec.elements && !spec.elements.includes(table.element[atom]!)) {
		return false;
	}
	if (spec.aromatic >= 0 && table.aromatic[atom] !== spec.aromatic) {
		return false;
	}
	if (spec.hydrogens >= 0 && table.hydrogens[atom] !== spec.hydrogens) {
		return false;
	}
	return table.neighbours[atom]!.length <= spec.maxNeighbours;
}

function bonded(table: AtomTable, a: number, b: number, mask: number): boolean {
	const i = table.neighbours[a]!.indexOf(b);
	return i >= 0 && (table.bonds[a]![i]! & mask) !== 0;
}
