import type { MainModule } from '@rdkit/rdkit';
import { beforeAll, describe, expect, it } from 'vitest';
import { protectedStructure } from '../../src/lib/rules/plan/draw';
import { freeUnits } from '../../src/lib/rules/plan/track';
import rows from '../../rules/protecting-groups.json';
import { rdkit } from './rdkit';
import { MODEL_SUBSTRATES as MODELS } from '../factories/model-substrates';

// The planner draws protected intermediates by running each PG's install transform (a reaction
// SMARTS in rules/protecting-groups.json) with openchemlib's Reactor on chosen atoms. RDKit (the
// @rdkit/rdkit WASM build) runs the same reaction SMARTS independently; both answers are compared
// as RDKit canonical SMILES, stereo included. Substrates are small invented molecules.

let RDKit: MainModule;
beforeAll(async () => {
	RDKit = await rdkit();
});

/** RDKit's canonical SMILES of a structure (stereo kept). */
function canonical(smiles: string): string {
	const mol = RDKit.get_mol(smiles);
	try {
		if (!mol?.is_valid()) {
			throw new Error(`RDKit cannot read ${smiles}`);
		}
		return mol.get_smiles();
	} finally {
		mol?.delete();
	}
}

/** Every distinct product RDKit's reaction makes from the substrate, canonical. */
function rdkitProducts(smarts: string, smiles: string): Set<string> {
	const reaction = RDKit.get_rxn(smarts);
	const reactants = new RDKit.MolList();
	const substrate = RDKit.get_mol(smiles)!;
	reactants.append(substrate);
	try {
		if (!reaction) {
			throw new Error(`RDKit cannot read the reaction ${smarts}`);
		}
		const outcomes = reaction.run_reactants(reactants, 50);
		const products = new Set<string>();
		for (let i = 0; i < outcomes.size(); i++) {
			const product = outcomes.get(i)!.at(0)!;
			products.add(canonical(product.get_smiles()));
			product.delete();
		}
		outcomes.delete();
		return products;
	} finally {
		reaction?.delete();
		reactants.delete();
		substrate.delete();
	}
}

describe('install transforms agree with RDKit running the same reaction SMARTS', () => {
	for (const row of rows) {
		for (const transform of row.install.transforms) {
			for (const group of transform.groups) {
				it(`${row.id} on a ${group}`, () => {
					const model = MODELS[group]!;
					const unit = freeUnits(model).find((u) => u.id === group)!;
					const ours = canonical(
						protectedStructure(model, [
							{ pg: row.id, transform: transform.smarts, atoms: unit.atoms }
						])
					);
					const theirs = rdkitProducts(transform.smarts, model);
					// One site in each model, so RDKit makes one distinct product and ours is it.
					expect([...theirs]).toEqual([ours]);
				});
			}
		}
	}
});

describe('transforms change only the chosen site', () => {
	it('puts TBS on the secondary alcohol of a triol and leaves both primary ones free — worked example', () => {
		// The hydroxyls are 1,4 apart, so no two of them read as a diol.
		const triol = 'OCCC[C@H](O)CCCO';
		const secondary = freeUnits(triol).find((u) => u.id === 'alcohol-secondary')!;
		const ours = canonical(
			protectedStructure(triol, [
				{ pg: 'TBS', transform: '[O;H1:1]>>[O:1][Si](C)(C)C(C)(C)C', atoms: secondary.atoms }
			])
		);
		expect(rdkitProducts('[O;H1:1]>>[O:1][Si](C)(C)C(C)(C)C', triol)).toContain(ours);
		expect(ours).toBe(canonical('OCCC[C@H](O[Si](C)(C)C(C)(C)C)CCCO'));
	});

	it('masks a ketone, an alcohol and an amine of one molecule in one run, keeping both stereocentres — worked example', () => {
		const start = 'CC(=O)C[C@H](O)C[C@@H](N)CC';
		const units = freeUnits(start);
		const atomsOf = (id: string) => units.find((u) => u.id === id)!.atoms;
		const drawn = protectedStructure(start, [
			{ pg: 'dioxolane', transform: '[C:1]=O>>[C:1]1OCCO1', atoms: atomsOf('ketone') },
			{
				pg: 'TBS',
				transform: '[O;H1:1]>>[O:1][Si](C)(C)C(C)(C)C',
				atoms: atomsOf('alcohol-secondary')
			},
			{ pg: 'Boc', transform: '[#7;!H0:1]>>[#7:1]C(=O)OC(C)(C)C', atoms: atomsOf('amine-primary') }
		]);
		expect(canonical(drawn)).toBe(
			canonical('CC1(OCCO1)C[C@H](O[Si](C)(C)C(C)(C)C)C[C@@H](NC(=O)OC(C)(C)C)CC')
		);
	});

	it("puts one acetonide on the 1,2-diol of a 1,2,4-triol, not on its 1,3-diol — Greene's, acetonides of 1,2-diols (from memory)", () => {
		const triol = 'OC[C@@H](O)CCO';
		const diol = freeUnits(triol).find((u) => u.id === 'diol-1,2')!;
		const transform = rows
			.find((r) => r.id === 'acetonide')!
			.install.transforms.find((t) => t.groups.includes('diol-1,2'))!.smarts;
		const ours = canonical(
			protectedStructure(triol, [{ pg: 'acetonide', transform, atoms: diol.atoms }])
		);
		// Written from the other end, the centre's neighbours come in a new order: @@ becomes @.
		expect(ours).toBe(canonical('OCC[C@H]1COC(C)(C)O1'));
		expect(rdkitProducts(transform, triol)).toEqual(new Set([ours]));
	});
});
