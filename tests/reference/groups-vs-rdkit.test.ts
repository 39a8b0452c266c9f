// Free-group perception against RDKit: for every molecule of the reference set and every group of
// rules/groups.json, our instances (openchemlib, the `pattern` column) must be exactly RDKit's
// matches of the reference `smarts` column — same count and the same atom sets.

import { beforeAll, describe, expect, it } from 'vitest';
import type { MainModule } from '@rdkit/rdkit';
import { readStructure } from '../../src/lib/chem/parse';
import { findGroups } from '../../src/lib/chem/perceive';
import { perceptionRules } from '../../src/lib/chem/patterns';
import { referenceMolecules } from './molecules';
import { aromaticityDisagreements } from './aromaticity-cases';
import { atomSetKey, rdkit, rdkitMatches } from './rdkit';

let RDKit: MainModule;
beforeAll(async () => {
	RDKit = await rdkit();
});

const rules = perceptionRules();

describe('the reference molecule set', () => {
	it('has at least 60 structures, each of which RDKit can read', () => {
		expect(referenceMolecules.length).toBeGreaterThanOrEqual(60);
		for (const { smiles } of referenceMolecules) {
			const mol = RDKit.get_mol(smiles);
			expect(mol?.is_valid(), smiles).toBe(true);
			mol?.delete();
		}
	});
	it('exercises every group id at least once (RDKit finds each somewhere)', () => {
		const unseen = rules.groups
			.filter(
				(group) =>
					!referenceMolecules.some((m) => rdkitMatches(RDKit, m.smiles, group.smarts).length > 0)
			)
			.map((group) => group.id);
		expect(unseen).toEqual([]);
	});
});

describe.each(referenceMolecules)('$name', ({ smiles }) => {
	it('has the same instances of every group as RDKit', () => {
		const { molecule } = readStructure(smiles);
		const ours = findGroups(molecule);
		for (const group of rules.groups) {
			const expected = rdkitMatches(RDKit, smiles, group.smarts);
			const found = ours.filter((g) => g.id === group.id).map((g) => g.atoms);
			expect({ id: group.id, count: found.length, atoms: atomSetKey(found) }).toEqual({
				id: group.id,
				count: expected.length,
				atoms: atomSetKey(expected)
			});
		}
	});
});

// Where RDKit's aromaticity model and the chemistry disagree, the chemistry wins; each case says
// what RDKit reports, what a chemist reports, and why (see aromatic-cases.ts).
describe.each(aromaticityDisagreements)('aromaticity: $name', (testCase) => {
	it(`RDKit reports ${JSON.stringify(testCase.rdkit)}, we report the chemistry ${JSON.stringify(testCase.chemistry)}`, () => {
		const ours = findGroups(readStructure(testCase.smiles).molecule);
		for (const [id, count] of Object.entries(testCase.rdkit)) {
			expect(
				rdkitMatches(RDKit, testCase.smiles, rules.groupsById.get(id)!.smarts).length,
				`RDKit ${id}`
			).toBe(count);
		}
		for (const [id, count] of Object.entries(testCase.chemistry)) {
			expect(ours.filter((g) => g.id === id).length, `ours ${id}`).toBe(count);
		}
	});
});
