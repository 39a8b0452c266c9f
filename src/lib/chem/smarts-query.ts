// Reading a SMARTS into an exact query that smarts-match.ts runs over the atom table in plain
// TypeScript. It reads the SMARTS the rule tables use (element symbols, #n, a/A, H, X, D, r,
// charges, `,` `;` `&` `!`, recursive `$()`, ring closures, the bonds - = # : ~) with openchemlib's
// meaning where it differs from Daylight's: an upper-case symbol names the element only (aromatic
// atoms match too), an unwritten bond is aromatic between two aromatic atoms, single otherwise,
// `r<n>` is the size of the atom's smallest ring, `D4` is four or more connections. Anything else
// (chirality, isotopes, R, x, v, bond expressions, '.', and the `r`/`D` forms openchemlib reads
// loosely or not at all, see ringSizeTest and degreeTest) makes the reader give up with null, and
// the pattern stays with openchemlib. That the two agree on every mapping is
// tests/unit/chem-smarts-match.test.ts.
import {
	ANY_BOND,
	AROMATIC,
	AROMATIC_SYMBOLS,
	BOND_SYMBOLS,
	ORGANIC,
	SINGLE,
	Unsupported,
	aromaticElement,
	closingBracket,
	closingParen,
	primitive,
	splitTop,
	testsRingSize,
	type AtomTest
} from './smarts-primitives';

// Bond bits and the atom test type are defined with the primitives; callers read them here.
export { AROMATIC, DOUBLE, SINGLE, TRIPLE, type AtomTest } from './smarts-primitives';

/** A pattern as a spanning tree in SMARTS order (each atom's parent comes earlier) plus ring closures. */
export type ExactQuery = {
	atoms: AtomTest[];
	parent: number[];
	/** Bond bits (SINGLE | DOUBLE | TRIPLE | AROMATIC) the bond to the parent may have. */
	parentBond: number[];
	/** Ring-closure bonds, listed under the later of their two atoms. */
	closures: { other: number; bond: number }[][];
	/** The atom map number of each atom (0: none); atom roles in patterns.ts. */
	mapNumbers: number[];
};

const recursiveQueries = new Map<string, ExactQuery>();

/** The exact query of a SMARTS, or null when it uses syntax read only by openchemlib, e.g. `exactQuery('[OX2H;A:1]c')`. */
export function exactQuery(smarts: string): ExactQuery | null {
	try {
		return readChain(smarts);
	} catch (caught) {
		if (caught instanceof Unsupported) {
			return null;
		}
		throw caught;
	}
}

function readChain(smarts: string): ExactQuery {
	const query: ExactQuery = { atoms: [], parent: [], parentBond: [], closures: [], mapNumbers: [] };
	const writtenAromatic: boolean[] = [];
	const branches: number[] = [];
	const rings = new Map<string, { atom: number; bond: number | null }>();
	let previous = -1;
	let bond: number | null = null;
	const unwritten = (a: number, b: number) =>
		writtenAromatic[a] && writtenAromatic[b] ? AROMATIC : SINGLE;
	for (let i = 0; i < smarts.length; i++) {
		const ch = smarts[i]!;
		let atom: { test: AtomTest; aromatic: boolean; map: number } | null = null;
		if (ch === '(') {
			branches.push(previous);
		} else if (ch === ')') {
			previous = branches.pop() ?? -1;
		} else if (ch in BOND_SYMBOLS) {
			if (bond !== null) {
				throw new Unsupported();
			} // a bond expression such as '-,:'
			bond = BOND_SYMBOLS[ch]!;
		} else if (/[0-9%]/.test(ch)) {
			const label = ch === '%' ? smarts.slice(i, i + 3) : ch;
			if (ch === '%') {
				i += 2;
			}
			if (previous < 0) {
				throw new Unsupported();
			}
			const open = rings.get(label);
			if (open) {
				rings.delete(label);
				const closing = bond ?? open.bond ?? unwritten(open.atom, previous);
				query.closures[previous]!.push({ other: open.atom, bond: closing });
			} else {
				rings.set(label, { atom: previous, bond });
			}
			bond = null;
		} else if (ch === '[') {
			const close = closingBracket(smarts, i);
			if (close < 0) {
				throw new Unsupported();
			}
			atom = bracketAtom(smarts.slice(i + 1, close));
			i = close;
		} else {
			const symbol = /^(Cl|Br|[BCNOPSFI]|[bcnops]|[aA*])/.exec(smarts.slice(i))?.[1];
			if (!symbol) {
				throw new Unsupported();
			}
			atom = symbolAtom(symbol);
			i += symbol.length - 1;
		}
		if (!atom) {
			continue;
		}
		const index = query.atoms.length;
		if (index > 0 && previous < 0) {
			throw new Unsupported();
		} // '.': disconnected parts
		query.atoms.push(atom.test);
		query.mapNumbers.push(atom.map);
		query.closures.push([]);
		writtenAromatic.push(atom.aromatic);
		query.parent.push(previous);
		query.parentBond.push(previous < 0 ? ANY_BOND : (bond ?? unwritten(previous, index)));
		bond = null;
		previous = index;
	}
	if (query.atoms.length === 0 || rings.size > 0 || branches.length > 0) {
		throw new Unsupported();
	}
	return query;
}

function symbolAtom(symbol: string): { test: AtomTest; aromatic: boolean; map: number } {
	if (symbol === '*') {
		return { test: { kind: 'all', tests: [] }, aromatic: false, map: 0 };
	}
	if (symbol === 'a' || symbol === 'A') {
		return {
			test: { kind: 'aromatic', aromatic: symbol === 'a' },
			aromatic: symbol === 'a',
			map: 0
		};
	}
	if (symbol in AROMATIC_SYMBOLS) {
		return { test: aromaticElement(AROMATIC_SYMBOLS[symbol]!), aromatic: true, map: 0 };
	}
	return { test: { kind: 'element', element: ORGANIC[symbol]! }, aromatic: false, map: 0 };
}

/** `[...]`: the map number comes off the end; the rest is an expression (`;` < `,` < `&` and adjacency < `!`). */
function bracketAtom(inside: string): { test: AtomTest; aromatic: boolean; map: number } {
	const mapped = /:(\d+)$/.exec(inside);
	const body = mapped ? inside.slice(0, mapped.index) : inside;
	if (body === '' || /^\d/.test(body) || /^H[+-]?\d*$/.test(body) || /[@]/.test(body)) {
		throw new Unsupported();
	}
	return { test: lowAnd(body), aromatic: /^[a-z]/.test(body), map: mapped ? Number(mapped[1]) : 0 };
}

const combine = (kind: 'all' | 'any', tests: AtomTest[]): AtomTest =>
	tests.length === 1 ? tests[0]! : { kind, tests };
const lowAnd = (text: string) => combine('all', splitTop(text, ';').map(or));
function or(text: string): AtomTest {
	const alternatives = splitTop(text, ',').map(highAnd);
	// openchemlib keeps one ring size per atom: it reads `[C;r5,r6]` as r5 and refuses `[C;r5,N]`.
	if (alternatives.length > 1 && alternatives.some(testsRingSize)) {
		throw new Unsupported();
	}
	return combine('any', alternatives);
}
const highAnd = (text: string) => combine('all', splitTop(text, '&').flatMap(primitives));

/** A run of primitives, each maybe negated: `!$(NC=O)`, `NX3`, `CH2`, `+`, `#6`. */
function primitives(run: string): AtomTest[] {
	const tests: AtomTest[] = [];
	for (let i = 0; i < run.length;) {
		const negated = run[i] === '!';
		if (negated) {
			i++;
		}
		let test: AtomTest;
		const rest = run.slice(i);
		if (rest.startsWith('$(')) {
			const end = closingParen(rest, 1);
			const text = rest.slice(2, end);
			// One query object per recursive text, so its per-molecule results are shared by every
			// pattern that writes it (`!$([#6]=[O,S,N])` is in most PG patterns).
			let inner = recursiveQueries.get(text);
			if (!inner) {
				recursiveQueries.set(text, (inner = readChain(text)));
			}
			test = { kind: 'recursive', query: inner };
			i += end + 1;
		} else {
			const token = /^(#\d+|[+-]+\d*|[A-Z][a-z]?|[a-z]{1,2}|\d+)(\d*)/.exec(rest);
			if (!token) {
				throw new Unsupported();
			}
			test = primitive(token[1]!, token[2]!, tests.length === 0 && !negated);
			i += token[0].length;
		}
		// openchemlib ignores a negated ring size (`[*;!r5]` matches every atom).
		if (negated && testsRingSize(test)) {
			throw new Unsupported();
		}
		tests.push(negated ? { kind: 'not', test } : test);
	}
	return tests;
}
