// Chemical sanity checks on a freshly parsed molecule. openchemlib's validate() complains about
// several things; only a real impossibility (too many bonds on an atom, an aromatic ring that
// cannot be given alternating bonds) rejects the structure. Stereo complaints, an unbalanced net
// charge (a salt drawn without its counter-ion) and atoms too close in a drawing are warnings.

import { Molecule } from 'openchemlib';
import { isPlausibleMassNumber } from './elements';
import { StructureError, toolkitMessage } from './errors';

export type AtomDescriber = {
	describeAtom: (atom: number) => string;
	positionOf: (atom: number) => number | undefined;
	wasWrittenAromatic: (atom: number) => boolean;
	record?: number;
	/** false skips openchemlib's validate() (stereo perception, warnings only: see ReadOptions). */
	warnings?: boolean;
};

/** Throws StructureError for impossible valences or aromaticity and returns the warnings, e.g. `validateMolecule(mol, describer)` → `[]`. */
export function validateMolecule(molecule: Molecule, where: AtomDescriber): string[] {
	molecule.ensureHelperArrays(Molecule.cHelperRings);
	for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
		if (molecule.getFreeValence(atom) < 0) {
			const bonds = molecule.getOccupiedValence(atom);
			throw new StructureError(
				'bad_valence',
				`Too many bonds at ${where.describeAtom(atom)}: ${molecule.getAtomLabel(atom)} carries ${bonds} bonds where at most ${molecule.getMaxValence(atom)} are allowed.`,
				{ atom, position: where.positionOf(atom), record: where.record }
			);
		}
		const massNumber = molecule.getAtomMass(atom);
		if (massNumber !== 0 && !isPlausibleMassNumber(molecule.getAtomicNo(atom), massNumber)) {
			throw new StructureError(
				'bad_isotope',
				`The mass number ${massNumber} at ${where.describeAtom(atom)} is not one an isotope of ${molecule.getAtomLabel(atom)} can have.`,
				{ atom, position: where.positionOf(atom), record: where.record }
			);
		}
		// openchemlib leaves a radical where it could not place alternating double bonds.
		if (where.wasWrittenAromatic(atom) && molecule.getAtomRadical(atom) !== 0) {
			throw new StructureError(
				'invalid_structure',
				`The aromatic ring at ${where.describeAtom(atom)} cannot be drawn with alternating double bonds (check the ring size and [nH] atoms).`,
				{ atom, position: where.positionOf(atom), record: where.record }
			);
		}
	}
	const warnings: string[] = [];
	// Its valence check is the getFreeValence() test above (free = max − occupied), so what is left
	// can only warn.
	if (where.warnings === false) {
		return warnings;
	}
	try {
		molecule.validate();
	} catch (caught) {
		const message = toolkitMessage(caught);
		if (/valence/i.test(message)) {
			throw new StructureError(
				'bad_valence',
				`The structure has an atom with too many bonds (${message}).`,
				{ record: where.record }
			);
		}
		warnings.push(message);
	}
	return warnings;
}
