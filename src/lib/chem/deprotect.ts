// Imagined removal of a protecting group, used only to name what it masks. The result is a new
// molecule; the input is never changed.

import { Molecule } from 'openchemlib';

export type Restore = 'hydrogen' | 'carbonyl';

/**
 * Deletes the PG atoms; free valences fill with hydrogen, and for `carbonyl` the first masked
 * atom gets a double-bonded oxygen back, e.g. a dioxolane ketal becomes the ketone.
 * `atomMap[old]` is the atom's new index (-1 when deleted).
 */
export function withoutProtectingGroup(
	molecule: Molecule,
	leaving: number[],
	masked: number[],
	restore: Restore
) {
	const freed = molecule.getCompactCopy();
	const atomMap = freed.deleteAtoms(leaving);
	if (restore === 'carbonyl') {
		const carbon = atomMap[masked[0]!]!;
		const oxygen = freed.addAtom(8);
		const bond = freed.addBond(carbon, oxygen);
		freed.setBondType(bond, Molecule.cBondTypeDouble);
	}
	return { molecule: freed, atomMap };
}
