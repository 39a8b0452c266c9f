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

export const SINGLE = 1;
export const DOUBLE = 2;
export const TRIPLE = 4;
export const AROMATIC = 8;
const ANY_BOND = SINGLE | DOUBLE | TRIPLE | AROMATIC;
const BOND_SYMBOLS: Record<string, number> = {
	'-': SINGLE,
	'=': DOUBLE,
	'#': TRIPLE,
	':': AROMATIC,
	'~': ANY_BOND,
	'/': SINGLE,
	'\\': SINGLE
};

/** One test on a molecule atom, or a combination of them. */
export type AtomTest =
	| { kind: 'all' | 'any'; tests: AtomTest[] }
	| { kind: 'not'; test: AtomTest }
	| { kind: 'element'; element: number }
	| { kind: 'aromatic'; aromatic: boolean }
	| { kind: 'hydrogens'; count: number }
	| { kind: 'connections'; count: number }
	/** Explicit connections (SMARTS `D`): exactly `count`, or at least it when `atLeast`. */
	| { kind: 'degree'; count: number; atLeast: boolean }
	/** The size of the atom's smallest ring (SMARTS `r<n>`). */
	| { kind: 'ringSize'; size: number }
	| { kind: 'charge'; charge: number }
	| { kind: 'recursive'; query: ExactQuery };

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

const ORGANIC: Record<string, number> = {
	B: 5,
	C: 6,
	N: 7,
	O: 8,
	F: 9,
	P: 15,
	S: 16,
	Cl: 17,
	Br: 35,
	I: 53
};
const AROMATIC_SYMBOLS: Record<string, number> = { b: 5, c: 6, n: 7, o: 8, p: 15, s: 16 };
/** Bracket symbols read here; others (and ambiguous ones such as Sc, Cs) leave the pattern to openchemlib. */
const BRACKET_ELEMENTS: Record<string, number> = {
	...ORGANIC,
	Si: 14,
	Se: 34,
	Sn: 50,
	Li: 3,
	Na: 11,
	K: 19,
	Mg: 12,
	Zn: 30,
	Cu: 29,
	Pd: 46
};

class Unsupported extends Error {}

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

const aromaticElement = (element: number): AtomTest => ({
	kind: 'all',
	tests: [
		{ kind: 'element', element },
		{ kind: 'aromatic', aromatic: true }
	]
});

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

/** `[...]`: the map number comes off the end; the rest is an expression (`;` < `,` < `&` and adjacency < `!`). */
function bracketAtom(inside: string): { test: AtomTest; aromatic: boolean; map: number } {
	const mapped = /:(\d+)$/.exec(inside);
	const body = mapped ? inside.slice(0, mapped.index) : inside;
	if (body === '' || /^\d/.test(body) || /^H[+-]?\d*$/.test(body) || /[@]/.test(body)) {
		throw new Unsupported();
	}
	return { test: lowAnd(body), aromatic: /^[a-z]/.test(body), map: mapped ? Number(mapped[1]) : 0 };
}

/** Splits at `separator` outside parentheses (recursive parts keep theirs). */
function splitTop(text: string, separator: string): string[] {
	const parts: string[] = [];
	let depth = 0;
	let start = 0;
	for (let i = 0; i < text.length; i++) {
		if (text[i] === '(') {
			depth++;
		} else if (text[i] === ')') {
			depth--;
		} else if (depth === 0 && text[i] === separator) {
			parts.push(text.slice(start, i));
			start = i + 1;
		}
	}
	parts.push(text.slice(start));
	if (parts.some((part) => part === '')) {
		throw new Unsupported();
	}
	return parts;
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

function closingParen(text: string, open: number): number {
	let depth = 0;
	for (let j = open; j < text.length; j++) {
		if (text[j] === '(') {
			depth++;
		} else if (text[j] === ')' && --depth === 0) {
			return j;
		}
	}
	throw new Unsupported();
}

/** One primitive; `first` says whether it opens its run (only there is a symbol an element). */
function primitive(head: string, digits: string, first: boolean): AtomTest {
	const count = digits === '' ? 1 : Number(digits);
	if (head.startsWith('#')) {
		if (digits !== '') {
			throw new Unsupported();
		}
		return { kind: 'element', element: Number(head.slice(1)) };
	}
	if (head.startsWith('+') || head.startsWith('-')) {
		const signs = head.replace(/\d+$/, '');
		if (!/^(\++|-+)$/.test(signs) || (signs.length > 1 && signs.length !== head.length)) {
			throw new Unsupported();
		}
		const magnitude = signs.length === head.length ? signs.length : Number(head.slice(1));
		return { kind: 'charge', charge: signs[0] === '+' ? magnitude : -magnitude };
	}
	// '[H]' alone (a hydrogen atom) was refused in bracketAtom, so H is always a hydrogen count.
	if (head === 'H') {
		return { kind: 'hydrogens', count };
	}
	if (head === 'X') {
		return { kind: 'connections', count };
	}
	if (head === 'A' || head === 'a') {
		if (digits !== '') {
			throw new Unsupported();
		}
		return { kind: 'aromatic', aromatic: head === 'a' };
	}
	if (head === 'D') {
		return degreeTest(digits);
	}
	if (head === 'r') {
		return ringSizeTest(digits);
	}
	if (digits !== '' || !first) {
		throw new Unsupported();
	} // isotopes, R, v, x, …
	if (head in BRACKET_ELEMENTS) {
		return { kind: 'element', element: BRACKET_ELEMENTS[head]! };
	}
	if (head in AROMATIC_SYMBOLS) {
		return aromaticElement(AROMATIC_SYMBOLS[head]!);
	}
	throw new Unsupported();
}

/** Whether a test (outside recursive parts) asks for a ring size. */
function testsRingSize(test: AtomTest): boolean {
	if (test.kind === 'all' || test.kind === 'any') {
		return test.tests.some(testsRingSize);
	}
	if (test.kind === 'not') {
		return testsRingSize(test.test);
	}
	return test.kind === 'ringSize';
}

/**
 * `D<n>` as openchemlib reads it: D0 to D3 exactly, D4 four or more (S with six F is D4, D5 and
 * D6 alike); it ignores D5 and up and a bare D, so those stay with it.
 */
function degreeTest(digits: string): AtomTest {
	const count = Number(digits);
	if (digits === '' || count > 4) {
		throw new Unsupported();
	}
	return { kind: 'degree', count, atLeast: count === 4 };
}

/**
 * `r<n>` as openchemlib reads it: the atom's smallest ring has n atoms, so the fused carbons of
 * indole are r5, not r6. It ignores r8 and up and a bare r (every atom matches), so those stay with it.
 */
function ringSizeTest(digits: string): AtomTest {
	const size = Number(digits);
	if (digits === '' || size < 3 || size > 7) {
		throw new Unsupported();
	}
	return { kind: 'ringSize', size };
}
