import { oxygenProtection } from './molecule-families/oxygen-protection';
import { carbonylAmineAcidThiol } from './molecule-families/carbonyl-amine-acid-thiol';
import { oxygenIssue11 } from './molecule-families/oxygen-issue-11';
import { freeGroups } from './molecule-families/free-groups';
import { groupsIssue11 } from './molecule-families/groups-issue-11';
import { routeIntermediates } from './molecule-families/route-intermediates';

// The reference molecule set: intermediates of Orthogon's invented scenario (OG-2031, OG-2044,
// OG-3107 and friends). Names are fictional; the structures are ordinary, chemically sensible
// drug-like, natural-product-like and protecting-group-bearing molecules written for these tests.
// `pgs` lists the protecting groups a chemist would name on the structure (common practice); the
// functional-group counts are not written here at all: they come from RDKit at test time.

export type ReferenceMolecule = { name: string; smiles: string; pgs?: string[] };

// The set is split by family under molecule-families/, in the order the tests always read it.
export const referenceMolecules: ReferenceMolecule[] = [
	...oxygenProtection,
	...carbonylAmineAcidThiol,
	...oxygenIssue11,
	...freeGroups,
	...groupsIssue11,
	...routeIntermediates
];
