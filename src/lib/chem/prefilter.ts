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

import { Molecule } from 'openchemlib';

/**
 * What one pattern atom asks of a molecule atom, all of it at once: one of `elements` (null: any),
 * aromatic or not (-1: either), an exact hydrogen count (-1: any), at most `maxNeighbours` heavy
 * neighbours. Plain fields rather than closures: this runs a few hundred thousand times a route.
 */
type AtomSpec = {
	elements: number[] | null;
	aromatic: number;
	hydrogens: number;
	maxNeighbours: number;
};

/** A pattern as a spanning tree in SMARTS order (each atom's parent comes earlier) plus ring closures. */
export type LooseQuery = {
	atoms: AtomSpec[];
	parent: number[];
	parentBond: number[];
	/** Ring-closure bonds, listed under the later of their two atoms. */
	closures: { other: number; bond: number }[][];
};

/** The molecule as the test reads it: heavy atoms only, as openchemlib's searcher does. */
export type AtomTable = {
	element: Int16Array;
	aromatic: Uint8Array;
	hydrogens: Int16Array;
	/** Formal charge (smarts-match.ts reads it; the loose test does not). */
	charge: Int8Array;
	/** Size of the smallest ring through the atom as openchemlib reports it, 0 in none (SMARTS `r<n>`). */
	ringSize: Int16Array;
	neighbours: number[][];
	/** Bond bits to each neighbour, same order as `neighbours`. */
	bonds: number[][];
	/**
	 * Atoms whose X and H openchemlib reads in ways of its own (an N+ with four carbons is X3 to
	 * it): charged atoms, radicals, hydrogen atoms kept as atoms (deuterium) and the atoms bearing
	 * them. smarts-match.ts hands a search to openchemlib when it would test X or H on one.
	 */
	odd: Uint8Array;
	/** No odd atom at all. */
	plain: boolean;
};

// Bond bits: a molecule bond has one order bit, plus AROMATIC when it is aromatic.
const SINGLE = 1;
const DOUBLE = 2;
const TRIPLE = 4;
const AROMATIC = 8;
const ANY = 15;
const BOND_SYMBOLS: Record<string, number> = {
	'-': SINGLE | AROMATIC,
	'=': DOUBLE | AROMATIC,
	'#': TRIPLE,
	':': AROMATIC,
	'~': ANY,
	'/': SINGLE | AROMATIC,
	'\\': SINGLE | AROMATIC
};
/** An unwritten bond: openchemlib reads it as single; aromatic is allowed too, to stay loose. */
const DEFAULT_BOND = SINGLE | AROMATIC;

const ELEMENTS: Record<string, number> = {
	B: 5,
	C: 6,
	N: 7,
	O: 8,
	F: 9,
	Si: 14,
	P: 15,
	S: 16,
	Cl: 17,
	Br: 35,
	I: 53
};
const AROMATIC_ELEMENTS: Record<string, number> = { b: 5, c: 6, n: 7, o: 8, p: 15, s: 16 };

/** Reads the table once per molecule, e.g. `atomTable(Molecule.fromSmiles('CCO'))`. */
export function atomTable(molecule: Molecule): AtomTable {
	// Rings and aromaticity first (a no-op when done): a fresh molecule has no hydrogen counts yet.
	molecule.ensureHelperArrays(Molecule.cHelperRings);
	const count = molecule.getAtoms();
	const table: AtomTable = {
		element: new Int16Array(count),
		aromatic: new Uint8Array(count),
		hydrogens: new Int16Array(count),
		charge: new Int8Array(count),
		ringSize: new Int16Array(count),
		neighbours: [],
		bonds: [],
		odd: new Uint8Array(count),
		plain: true
	};
	for (let atom = 0; atom < count; atom++) {
		table.element[atom] = molecule.getAtomicNo(atom);
		table.aromatic[atom] = molecule.isAromaticAtom(atom) ? 1 : 0;
		table.hydrogens[atom] = molecule.getAllHydrogens(atom);
		table.charge[atom] = molecule.getAtomCharge(atom);
		table.ringSize[atom] = molecule.getAtomRingSize(atom);
		if (table.charge[atom] !== 0 || molecule.getAtomRadical(atom) !== 0) {
			table.odd[atom] = 1;
		}
		const neighbours: number[] = [];
		const bonds: number[] = [];
		for (let i = 0; i < molecule.getConnAtoms(atom); i++) {
			const bond = molecule.getConnBond(atom, i);
			const order = molecule.getBondOrder(bond);
			neighbours.push(molecule.getConnAtom(atom, i));
			bonds.push(
				(order === 1 ? SINGLE : order === 2 ? DOUBLE : order === 3 ? TRIPLE : 0) |
					(molecule.isAromaticBond(bond) ? AROMATIC : 0)
			);
		}
		table.neighbours.push(neighbours);
		table.bonds.push(bonds);
	}
	for (let atom = 0; atom < count; atom++) {
		if (table.element[atom] !== 1) {
			continue;
		}
		table.odd[atom] = 1;
		for (const other of table.neighbours[atom]!) {
			table.odd[other] = 1;
		}
	}
	table.plain = !table.odd.includes(1);
	return table;
}

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

/** The loose query of a SMARTS, or null when it uses syntax this reader does not know (then every molecule is searched), e.g. `looseQuery('[CX4:1]1[OX2][CX4]1')`. */
export function looseQuery(smarts: string): LooseQuery | null {
	const query: LooseQuery = { atoms: [], parent: [], parentBond: [], closures: [] };
	const branches: number[] = [];
	const rings = new Map<string, { atom: number; bond: number | null }>();
	let previous = -1;
	let bond: number | null = null;
	for (let i = 0; i < smarts.length; i++) {
		const ch = smarts[i]!;
		let test: AtomSpec | null = null;
		if (ch === '(') {
			branches.push(previous);
		} else if (ch === ')') {
			previous = branches.pop() ?? -1;
		} else if (ch in BOND_SYMBOLS) {
			bond = BOND_SYMBOLS[ch]!;
		} else if (/[0-9%]/.test(ch)) {
			const label = ch === '%' ? smarts.slice(i, i + 3) : ch;
			if (ch === '%') {
				i += 2;
			}
			const open = rings.get(label);
			if (previous < 0) {
				return null;
			}
			if (open) {
				rings.delete(label);
				query.closures[previous]!.push({
					other: open.atom,
					bond: bond ?? open.bond ?? DEFAULT_BOND
				});
			} else {
				rings.set(label, { atom: previous, bond });
			}
			bond = null;
		} else if (ch === '[') {
			const close = closingBracket(smarts, i);
			if (close < 0) {
				return null;
			}
			test = bracketTest(smarts.slice(i + 1, close));
			i = close;
		} else {
			const symbol = /^(Cl|Br|[BCNOPSFI]|[bcnops])/.exec(smarts.slice(i))?.[1];
			if (!symbol) {
				return null;
			} // '.', '*', … : not worth reading
			test = elementTest(symbol);
			i += symbol.length - 1;
		}
		if (!test) {
			continue;
		}
		const index = query.atoms.length;
		query.atoms.push(test);
		query.closures.push([]);
		if (index > 0 && previous < 0) {
			return null;
		}
		query.parent.push(previous);
		query.parentBond.push(bond ?? DEFAULT_BOND);
		bond = null;
		previous = index;
	}
	return query.atoms.length > 0 && rings.size === 0 && branches.length === 0 ? query : null;
}

function closingBracket(smarts: string, open: number): number {
	let depth = 0;
	for (let j = open; j < smarts.length; j++) {
		if (smarts[j] === '[') {
			depth++;
		} else if (smarts[j] === ']' && --depth === 0) {
			return j;
		}
	}
	return -1;
}

const anyAtom = (): AtomSpec => ({
	elements: null,
	aromatic: -1,
	hydrogens: -1,
	maxNeighbours: Infinity
});

/** Uppercase symbols test the element only: openchemlib does not read them as aliphatic (hence the `;A` in patterns). */
function elementTest(symbol: string): AtomSpec | null {
	if (symbol in AROMATIC_ELEMENTS) {
		return { ...anyAtom(), elements: [AROMATIC_ELEMENTS[symbol]!], aromatic: 1 };
	}
	const element = ELEMENTS[symbol];
	return element === undefined ? null : { ...anyAtom(), elements: [element] };
}

/**
 * A bracket atom: `;`-separated terms must all hold, each a `,`-list of alternatives, each a run of
 * primitives. Recursive parts are dropped first and any primitive not read here counts as true; a
 * list is kept only when it is a list of plain elements ([Cl,Br,I]).
 */
function bracketTest(inside: string): AtomSpec {
	const plain = dropRecursive(inside).replace(/:\d+$/, '');
	const spec = anyAtom();
	for (const term of plain.split(';')) {
		const alternatives = term
			.split(',')
			.map((alternative) => primitives(alternative.replace(/&/g, '')));
		if (alternatives.length === 1) {
			merge(spec, alternatives[0]!);
		} else if (
			alternatives.every(
				(a) =>
					a.elements?.length === 1 &&
					a.aromatic < 0 &&
					a.hydrogens < 0 &&
					a.maxNeighbours === Infinity
			)
		) {
			merge(spec, { ...anyAtom(), elements: alternatives.map((a) => a.elements![0]!) });
		}
	}
	return spec;
}

/** Both must hold; contradictions (two elements, aromatic and not) leave nothing that fits. */
function merge(into: AtomSpec, spec: AtomSpec): void {
	if (spec.elements) {
		into.elements = into.elements
			? into.elements.filter((e) => spec.elements!.includes(e))
			: spec.elements;
	}
	if (spec.aromatic >= 0) {
		into.aromatic = into.aromatic >= 0 && into.aromatic !== spec.aromatic ? 2 : spec.aromatic;
	}
	if (spec.hydrogens >= 0) {
		into.hydrogens = into.hydrogens >= 0 && into.hydrogens !== spec.hydrogens ? 99 : spec.hydrogens;
	}
	into.maxNeighbours = Math.min(into.maxNeighbours, spec.maxNeighbours);
}

function dropRecursive(inside: string): string {
	let out = '';
	for (let i = 0; i < inside.length; i++) {
		if (inside.startsWith('$(', i) || inside.startsWith('!$(', i)) {
			let depth = 0;
			let j = inside.indexOf('(', i);
			for (; j < inside.length; j++) {
				if (inside[j] === '(') {
					depth++;
				} else if (inside[j] === ')' && --depth === 0) {
					break;
				}
			}
			i = j;
			continue;
		}
		out += inside[i];
	}
	return out;
}

function primitives(run: string): AtomSpec {
	const spec = anyAtom();
	for (let i = 0; i < run.length;) {
		const rest = run.slice(i);
		const negated = rest.startsWith('!');
		const token = /^!?(#\d+|Cl|Br|Si|[A-Z][a-z]?|[a-z]|[+-]+\d*|\d+|.)(\d*)/.exec(rest)!;
		i += token[0].length;
		if (negated) {
			continue;
		} // a negation only narrows: leaving it out stays loose
		const head = token[1]!;
		const count = token[2] === '' ? 1 : Number(token[2]);
		if (head.startsWith('#')) {
			merge(spec, { ...anyAtom(), elements: [Number(head.slice(1))] });
		} else if (head === 'H') {
			merge(spec, { ...anyAtom(), hydrogens: count });
		}
		// openchemlib's X is not always neighbours + H (it lets [CH3-] be X4), so only cap the heavy neighbours.
		else if (head === 'X') {
			merge(spec, { ...anyAtom(), maxNeighbours: count });
		} else if (head === 'A' || head === 'a') {
			merge(spec, { ...anyAtom(), aromatic: head === 'a' ? 1 : 0 });
		} else {
			// An element symbol; charges, isotopes and symbols not listed here count as true.
			const element = elementTest(head);
			if (element) {
				merge(spec, element);
			}
		}
	}
	return spec;
}
