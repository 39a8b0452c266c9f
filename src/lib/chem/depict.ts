// SVG drawings of a molecule, with chosen atoms shaded: bonds between two highlighted atoms get a
// background band, and highlighted atoms are selected (their labels change colour).

import { Molecule } from 'openchemlib';

export type DepictOptions = {
	width?: number;
	height?: number;
	highlight?: readonly number[];
	id?: string;
};

let drawings = 0;

/** An SVG of the molecule, e.g. `depictSvg(mol, { highlight: [0, 1] })`; the molecule is copied, never changed. */
export function depictSvg(molecule: Molecule, options: DepictOptions = {}): string {
	const copy = molecule.getCompactCopy();
	if (!hasCoordinates(copy)) {
		copy.inventCoordinates();
	}
	copy.ensureHelperArrays(Molecule.cHelperNeighbours);
	const chosen = new Set(options.highlight ?? []);
	for (const atom of chosen) {
		if (atom < copy.getAllAtoms()) {
			copy.setAtomSelection(atom, true);
		}
	}
	for (let bond = 0; bond < copy.getAllBonds(); bond++) {
		if (chosen.has(copy.getBondAtom(0, bond)) && chosen.has(copy.getBondAtom(1, bond))) {
			copy.setBondBackgroundHiliting(bond, true);
		}
	}
	// Ids keep several drawings on one page from sharing CSS rules.
	const id = options.id ?? `orthogon-structure-${++drawings}`;
	return copy.toSVG(options.width ?? 400, options.height ?? 300, id, {
		autoCrop: true,
		autoCropMargin: 10,
		suppressChiralText: true
	});
}

function hasCoordinates(molecule: Molecule): boolean {
	for (let atom = 1; atom < molecule.getAllAtoms(); atom++) {
		if (
			molecule.getAtomX(atom) !== molecule.getAtomX(0) ||
			molecule.getAtomY(atom) !== molecule.getAtomY(0)
		) {
			return true;
		}
	}
	return molecule.getAllAtoms() === 1;
}
