// The atom table: a molecule read once into typed arrays, which every TypeScript search reads
// (the loose pre-test in prefilter.ts, the exact matcher in smarts-match.ts, freed-target.ts).
// Kept apart from the searches so that each of them depends only on this shape, not on each other.

import { Molecule } from 'openchemlib';
import { AROMATIC, DOUBLE, SINGLE, TRIPLE } from './smarts-primitives';

// Bond bits (smarts-primitives.ts): a molecule bond has one order bit, plus AROMATIC when it is aromatic.

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
