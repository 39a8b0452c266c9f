// What a protecting group sits on, where that changes how it stands up to a condition class
// (a PG row's `whereOn`): N-Boc on an indole N falls to NaOMe, a TBS ether on a phenol O to
// K2CO3/MeOH. Read from the molecule and the PG's masked atom, never from its free-group name,
// so a Boc on a pyrrole (which no free group names yet) is still on an aromatic nitrogen.

import { Molecule } from 'openchemlib';
import type { PgSite } from '../ids';

const NITROGEN = 7;
const OXYGEN = 8;
const CARBON = 6;

/**
 * The site of the atom a PG masks, e.g. the N of `CC(C)(C)OC(=O)n1ccc2ccccc21` →
 * `aromatic-nitrogen`, the O of a phenolic TBS ether → `aryl-oxygen`, an alkyl O → undefined.
 */
export function siteOf(molecule: Molecule, atom: number): PgSite | undefined {
	molecule.ensureHelperArrays(Molecule.cHelperRings);
	const element = molecule.getAtomicNo(atom);
	if (element === NITROGEN && molecule.isAromaticAtom(atom)) {
		return 'aromatic-nitrogen';
	}
	if (element === OXYGEN) {
		for (let i = 0; i < molecule.getConnAtoms(atom); i++) {
			const neighbour = molecule.getConnAtom(atom, i);
			if (molecule.getAtomicNo(neighbour) === CARBON && molecule.isAromaticAtom(neighbour)) {
				return 'aryl-oxygen';
			}
		}
	}
	return undefined;
}

// The free groups whose atom fixes the site: the planner knows a need's group, not its atoms'
// aromaticity, and a group id is enough there (a phenol's O is always on an aromatic carbon).
const SITE_OF_GROUP: Readonly<Record<string, PgSite>> = {
	phenol: 'aryl-oxygen',
	'indole-nh': 'aromatic-nitrogen',
	'azole-nh': 'aromatic-nitrogen'
};

/** The site implied by a free-group id, e.g. `siteOfGroup('phenol')` → `aryl-oxygen`; undefined for an alcohol. */
export function siteOfGroup(groupId: string): PgSite | undefined {
	return SITE_OF_GROUP[groupId];
}
