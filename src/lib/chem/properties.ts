// Formula, average molar mass, canonical key and stereocentres of a molecule.

import { Canonizer, Molecule } from 'openchemlib';

/** Hill formula with the net charge, e.g. `formulaOf(Molecule.fromSmiles('OC(=O)C(F)(F)F'))` → `'C2HF3O2'`, `'C[N+](C)(C)C'` → `'C4H12N+'`. */
export function formulaOf(molecule: Molecule): string {
	// Our own count: openchemlib's formula string does not follow Hill order (it writes C2HO2F3).
	const counts = new Map<string, number>();
	const add = (element: string, n: number) => counts.set(element, (counts.get(element) ?? 0) + n);
	let charge = 0;
	for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
		add(molecule.getAtomLabel(atom), 1);
		add('H', molecule.getImplicitHydrogens(atom));
		charge += molecule.getAtomCharge(atom);
	}
	const hill = [...counts.keys()]
		.filter((element) => counts.get(element)! > 0)
		.sort((a, b) => hillRank(a, counts) - hillRank(b, counts) || a.localeCompare(b));
	const body = hill
		.map((element) => `${element}${counts.get(element) === 1 ? '' : counts.get(element)}`)
		.join('');
	const size = Math.abs(charge);
	return charge === 0 ? body : `${body}${size === 1 ? '' : size}${charge > 0 ? '+' : '-'}`;
}

/** Hill order: carbon first and hydrogen second when there is carbon, then alphabetical. */
function hillRank(element: string, counts: Map<string, number>): number {
	if (!counts.get('C')) {
		return 2;
	}
	return element === 'C' ? 0 : element === 'H' ? 1 : 2;
}

/** Average molar mass in g/mol to 2 decimals (IUPAC standard atomic weights), e.g. `molarMassOf(Molecule.fromSmiles('O'))` → `18.02`. */
export function molarMassOf(molecule: Molecule): number {
	return Math.round(molecule.getMolecularFormula().relativeWeight * 100) / 100;
}

export type CanonicalForm = {
	/** openchemlib ID code: equal for equal molecules however they were written. */
	key: string;
	/** `toCanonical[atom]` is the atom's rank in the canonical numbering. */
	toCanonical: number[];
	/** `fromCanonical[rank]` is the atom with that canonical rank. */
	fromCanonical: number[];
};

/**
 * The ID code and the atom numbering behind it, e.g. `canonicalForm(Molecule.fromSmiles('OCC')).key`
 * equals the key of `'CCO'`. Stereo counts only when the molecule was read with coordinates.
 */
export function canonicalForm(molecule: Molecule): CanonicalForm {
	const canonizer = new Canonizer(molecule);
	const toCanonical = [...canonizer.getGraphIndexes()];
	const fromCanonical: number[] = [];
	toCanonical.forEach((rank, atom) => {
		fromCanonical[rank] = atom;
	});
	return { key: canonizer.getIDCode(), toCanonical, fromCanonical };
}

/** Atoms that are stereocentres, specified or not, e.g. `stereocentres(fromSmiles('CC(O)CC'))` → `[1]`. Needs a molecule read with stereo. */
export function stereocentres(molecule: Molecule): number[] {
	molecule.ensureHelperArrays(Molecule.cHelperParities);
	const atoms: number[] = [];
	for (let atom = 0; atom < molecule.getAtoms(); atom++) {
		if (molecule.getAtomParity(atom) !== Molecule.cAtomParityNone) {
			atoms.push(atom);
		}
	}
	return atoms;
}
