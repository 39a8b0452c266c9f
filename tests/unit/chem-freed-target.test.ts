// Imagined PG removal without openchemlib (src/lib/chem/freed-target.ts): wherever the atom table
// is derived from the parent's, it must say what openchemlib's own copy says after deleting the
// atoms and perceiving again, for every PG match (accepted or not) over the reference set.

import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { perceptionRules } from '../../src/lib/chem/patterns';
import { findMatches, matchedAtoms, searchTarget } from '../../src/lib/chem/match';
import { atomTable, type AtomTable } from '../../src/lib/chem/prefilter';
import { derivedTable, freedTarget } from '../../src/lib/chem/freed-target';
import { withoutProtectingGroup } from '../../src/lib/chem/deprotect';
import { referenceMolecules } from '../reference/molecules';
import { aromaticityDisagreements } from '../reference/aromaticity-cases';
import { routeOG2031 } from '../factories/route-og2031';

const structures = [
	...referenceMolecules.map((m) => m.smiles),
	...routeOG2031.map((s) => s.smiles),
	...aromaticityDisagreements.map((c) => c.smiles),
	'CC(C)(C)OC(=O)n1ccc2ccccc21',
	'CC(C)(C)OC(=O)NCc1ccco1'
];
const rules = perceptionRules();

/** Atom by atom, neighbours as sorted "atom:bond" lists (the order of neighbours does not matter). */
function described(table: AtomTable) {
	return Array.from(table.element, (element, atom) => ({
		element,
		aromatic: table.aromatic[atom],
		hydrogens: table.hydrogens[atom],
		charge: table.charge[atom],
		ringSize: table.ringSize[atom],
		odd: table.odd[atom],
		neighbours: table.neighbours[atom]!.map(
			(other, i) => `${other}:${table.bonds[atom]![i]}`
		).sort()
	}));
}

describe('the imagined removal of a PG', () => {
	it('gives the table openchemlib gives, for every PG match of the reference set', () => {
		let derived = 0;
		let removals = 0;
		for (const smiles of structures) {
			const parent = searchTarget(readStructure(smiles).molecule);
			for (const pg of rules.protectingGroups) {
				for (const pattern of pg.compiled) {
					for (const match of findMatches(parent, pattern)) {
						const context = new Set(pattern.context.map((i) => match[i]!));
						const masked = pattern.masked.map((i) => match[i]!);
						const leaving = matchedAtoms(match).filter(
							(atom) => !context.has(atom) && !masked.includes(atom)
						);
						const fromOpenchemlib = withoutProtectingGroup(
							parent.molecule,
							leaving,
							masked,
							pg.restore
						);
						removals++;
						const fromTable = derivedTable(parent.table, leaving, masked, pg.restore);
						if (!fromTable) {
							continue;
						}
						derived++;
						expect(fromTable.atomMap, `${pg.id} on ${smiles}`).toEqual(
							Array.from(fromOpenchemlib.atomMap)
						);
						expect(described(fromTable.table), `${pg.id} on ${smiles}`).toEqual(
							described(atomTable(fromOpenchemlib.molecule))
						);
					}
				}
			}
		}
		expect(removals).toBeGreaterThan(100);
		expect(derived / removals).toBeGreaterThan(0.8);
	}, 60_000);

	it('goes to openchemlib where the table could be wrong: an aromatic ring cut open, an odd atom touched', () => {
		// Deleting one atom of a benzene ring leaves atoms openchemlib no longer calls aromatic.
		const ring = searchTarget(readStructure('OCc1ccccc1').molecule);
		expect(derivedTable(ring.table, [3], [2], 'hydrogen')).toBeNull();
		// An odd atom (here the N+) that would lose a bond: openchemlib decides its hydrogens.
		const ammonium = searchTarget(readStructure('C[N+](C)(C)CCO').molecule);
		expect(derivedTable(ammonium.table, [0], [1], 'hydrogen')).toBeNull();
		// Far from the removal it stays odd in the derived table, and no openchemlib copy is made.
		const charged = searchTarget(readStructure('C[N+](C)(C)CCO[Si](C)(C)C').molecule);
		const derived = derivedTable(charged.table, [7, 8, 9, 10], [6], 'hydrogen')!;
		expect(derived.table.odd[1]).toBe(1);
		expect(derived.table.plain).toBe(false);
		expect(freedTarget(charged, [7, 8, 9, 10], [6], 'hydrogen').target.table).toEqual(
			derived.table
		);
	});

	it('gives the carbonyl back for an acetal PG, and hydrogens for an ether PG', () => {
		const dioxolane = searchTarget(readStructure('CC1(CC)OCCO1').molecule);
		// atoms: C0 C1 C2 C3 O4 C5 C6 O7; the ketal carbon 1 keeps C0 and C2 and gets =O back.
		const freed = derivedTable(dioxolane.table, [4, 5, 6, 7], [1], 'carbonyl')!;
		expect(Array.from(freed.table.element)).toEqual([6, 6, 6, 6, 8]);
		expect(freed.table.neighbours[1]).toEqual([0, 2, 4]);
		// An acetonide leaving its diol cuts the dioxolane open: the fused carbons (r5) are r6 again.
		const acetonide = searchTarget(readStructure('CC1(C)OC2CCCCC2O1').molecule);
		expect(Array.from(acetonide.table.ringSize)).toEqual([0, 5, 0, 5, 5, 6, 6, 6, 6, 5, 5]);
		const diol = derivedTable(acetonide.table, [0, 1, 2], [3, 10], 'hydrogen')!;
		expect(Array.from(diol.table.ringSize)).toEqual([0, 6, 6, 6, 6, 6, 6, 0]);
		const diolFromOpenchemlib = withoutProtectingGroup(
			acetonide.molecule,
			[0, 1, 2],
			[3, 10],
			'hydrogen'
		);
		expect(Array.from(atomTable(diolFromOpenchemlib.molecule).ringSize)).toEqual([
			0, 6, 6, 6, 6, 6, 6, 0
		]);
		const tbs = searchTarget(readStructure('CCO[Si](C)(C)C').molecule);
		expect(
			Array.from(derivedTable(tbs.table, [3, 4, 5, 6], [2], 'hydrogen')!.table.hydrogens)
		).toEqual([3, 2, 1]);
	});
});
