// Which atom symbols a structure may use. Element symbols come from openchemlib's own table
// (atomic numbers 1–118), so the two can never disagree about what an element is.

import { Molecule } from 'openchemlib';

const ELEMENT_COUNT = 118;

/** Element symbols, e.g. `ELEMENT_SYMBOLS.has('Si')` → true, `ELEMENT_SYMBOLS.has('Qq')` → false. */
export const ELEMENT_SYMBOLS: ReadonlySet<string> = new Set(
	Molecule.cAtomLabel.slice(1, ELEMENT_COUNT + 1)
);

/** Aromatic (lower-case) atoms a SMILES may write (OpenSMILES, "aromatic symbols"). */
const SMILES_AROMATIC = new Set(['b', 'c', 'n', 'o', 'p', 's', 'se', 'as', 'te']);

/**
 * Molfile symbols that are not elements but are part of the format: deuterium and tritium,
 * query atoms (A, Q, L, LP, X, M and their H forms), R groups and the wildcard (CTfile
 * formats, BIOVIA, "Atom block").
 */
const MOLFILE_EXTRA = new Set([
	'D',
	'T',
	'A',
	'AH',
	'Q',
	'QH',
	'L',
	'LP',
	'X',
	'XH',
	'M',
	'MH',
	'R',
	'R#',
	'*'
]);

/** Whether a SMILES atom symbol names an element, e.g. `isSmilesSymbol('se')` → true. */
export function isSmilesSymbol(symbol: string): boolean {
	return symbol === '*' || ELEMENT_SYMBOLS.has(symbol) || SMILES_AROMATIC.has(symbol);
}

/** Whether a molfile atom-block symbol is an element or a format symbol, e.g. `isMolfileSymbol('R#')` → true. */
export function isMolfileSymbol(symbol: string): boolean {
	return ELEMENT_SYMBOLS.has(symbol) || MOLFILE_EXTRA.has(symbol);
}

/** Hydrogen and its isotopes, which do not count as heavy atoms. */
export function isHydrogenSymbol(symbol: string): boolean {
	return symbol === 'H' || symbol === 'D' || symbol === 'T';
}

/**
 * Whether a mass number is plausible for the element: at least the proton count and within
 * max(4, 30 %) of the most common isotope's mass number. The labels chemists use fall inside
 * this band (2H, 3H, 11C, 13C, 14C, 15N, 18O, 18F, 32P, 35S, 125I, 131I; common practice);
 * `[999C]` does not.
 * E.g. `isPlausibleMassNumber(6, 13)` → true.
 */
export function isPlausibleMassNumber(atomicNo: number, massNumber: number): boolean {
	const usual = Molecule.cRoundedMass[atomicNo];
	if (!usual) {
		return true;
	}
	return (
		massNumber >= atomicNo && Math.abs(massNumber - usual) <= Math.max(4, Math.round(usual * 0.3))
	);
}
