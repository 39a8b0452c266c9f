// Reading a SMARTS into the loose query of the pre-test (prefilter.ts). Deliberately looser than
// openchemlib: anything not understood here (recursive `$()`, negations, charges, ring primitives)
// counts as "may match", bonds accept aromatic as well, and `X<n>` only caps the heavy-atom
// neighbours. Apart from the exact reader (smarts-query.ts) because the two readers must differ:
// this one may only ever widen, that one must agree with openchemlib exactly.

import { AROMATIC, DOUBLE, SINGLE, TRIPLE, closingBracket } from './smarts-primitives';

/**
 * What one pattern atom asks of a molecule atom, all of it at once: one of `elements` (null: any),
 * aromatic or not (-1: either), an exact hydrogen count (-1: any), at most `maxNeighbours` heavy
 * neighbours. Plain fields rather than closures: this runs a few hundred thousand times a route.
 */
export type AtomSpec = {
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

const ANY = SINGLE | DOUBLE | TRIPLE | AROMATIC;
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
