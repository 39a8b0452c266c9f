// The leaves of the exact SMARTS reader (smarts-query.ts): bond bits, element symbols, the atom
// test type, bracket scanning, and the reading of one primitive (`#6`, `H2`, `X3`, `+`, `D4`, `r5`)
// with openchemlib's meaning. Apart from the chain reader so that each file holds one level of the
// grammar; the bond bits are also the atom table's (atom-table.ts), so both sides agree by import.

import type { ExactQuery } from './smarts-query';

export const SINGLE = 1;
export const DOUBLE = 2;
export const TRIPLE = 4;
export const AROMATIC = 8;
export const ANY_BOND = SINGLE | DOUBLE | TRIPLE | AROMATIC;
export const BOND_SYMBOLS: Record<string, number> = {
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

export const ORGANIC: Record<string, number> = {
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
export const AROMATIC_SYMBOLS: Record<string, number> = { b: 5, c: 6, n: 7, o: 8, p: 15, s: 16 };
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

/** Thrown where the exact reader meets syntax it leaves to openchemlib; exactQuery turns it into null. */
export class Unsupported extends Error {}

export const aromaticElement = (element: number): AtomTest => ({
	kind: 'all',
	tests: [
		{ kind: 'element', element },
		{ kind: 'aromatic', aromatic: true }
	]
});

/** The index of the `]` closing the `[` at `open`, or -1; nested `[` inside recursive parts count. */
export function closingBracket(smarts: string, open: number): number {
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

export /** Splits at `separator` outside parentheses (recursive parts keep theirs). */
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

export function closingParen(text: string, open: number): number {
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
export function primitive(head: string, digits: string, first: boolean): AtomTest {
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
export function testsRingSize(test: AtomTest): boolean {
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
