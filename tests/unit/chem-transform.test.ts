import { describe, expect, it } from 'vitest';
import { Molecule } from 'openchemlib';
import { applyTransforms, compileTransform, TransformError } from '../../src/lib/chem/transform';
import rows from '../../rules/protecting-groups.json';

// The transform runner's own guarantees; the chemistry of every PG's transform is compared with
// RDKit in tests/reference/transforms-vs-rdkit.test.ts.

const read = (smiles: string) => Molecule.fromSmiles(smiles, { noCoordinates: true });

describe('reaction SMARTS transforms on chosen atoms', () => {
	it('compiles every install transform in the rule table', () => {
		for (const row of rows) {
			for (const t of row.install.transforms) {
				expect(() => compileTransform(t.smarts), `${row.id}: ${t.smarts}`).not.toThrow();
			}
		}
	});

	it('refuses a transform with no mapped atom, two reactants, or SMARTS it would ignore', () => {
		expect(() => compileTransform('[OH]>>OC')).toThrow(TransformError);
		expect(() => compileTransform('[O:1]..[N:2]>>[O:1]C.[N:2]')).toThrow(
			/one reactant and one product/
		);
		expect(() => compileTransform('[O:1]>>[O:1]C>>C')).toThrow(/not one reaction SMARTS/);
	});

	it('changes only the site among the chosen atoms, however many the pattern matches', () => {
		const molecule = read('OCCCCO');
		expect(
			applyTransforms(molecule, [{ smarts: '[O;H1:1]>>[O:1]C', atoms: [5] }]).toIsomericSmiles()
		).toBe(read('OCCCCOC').toIsomericSmiles());
	});

	it('says so when the chosen atoms hold no site for the pattern', () => {
		expect(() =>
			applyTransforms(read('OCCC=O'), [{ smarts: '[C:1]=O>>[C:1]1OCCO1', atoms: [0, 1] }])
		).toThrow(/finds no site among atoms 0, 1/);
	});

	it('keeps an isotope label on a transformed atom and leaves the input molecule untouched', () => {
		const molecule = read('[18OH]CC');
		const product = applyTransforms(molecule, [{ smarts: '[O;H1:1]>>[O:1]C(C)=O', atoms: [0] }]);
		expect(product.toIsomericSmiles()).toBe(read('CC(=O)[18O]CC').toIsomericSmiles());
		expect(molecule.toIsomericSmiles()).toBe(read('[18OH]CC').toIsomericSmiles());
	});
});
