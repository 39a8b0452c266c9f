import { describe, expect, it } from 'vitest';
import { mapAtoms } from '../../src/lib/chem/atom-map';
import { sharedMolecule } from '../../src/lib/chem/molecule-cache';
import { mapAtomsByText } from '../../src/lib/chem/text-atom-map';
import { freeUnits } from '../../src/lib/rules/plan/track';
import { STRESS_ROUTE, TEXTBOOK_ROUTES } from '../factories/plan-routes';

// A step's atom map read off the text its two SMILES share must pair the free groups as the
// maximum common substructure (MCS) does, and must refuse when the shared text is not a common
// substructure. Structures are invented OG-2031 intermediates.

const byText = (a: string, b: string, needed: number[]) =>
	mapAtomsByText(a, b, sharedMolecule(a), sharedMolecule(b), needed);
const unitAtoms = (smiles: string) => freeUnits(smiles).flatMap((u) => u.atoms);

describe('atom maps from the text two SMILES share', () => {
	const steps = [STRESS_ROUTE, ...TEXTBOOK_ROUTES].flatMap((doc) =>
		doc.steps.map((step) => {
			const text = (id: string) => doc.intermediates.find((n) => n.id === id)!.structure;
			return [`${doc.name} ${step.id}`, text(step.from[0]!), text(step.to)] as const;
		})
	);
	for (const [name, substrate, product] of steps) {
		it(`pairs the free groups as the MCS does on ${name}`, () => {
			const mcs = mapAtoms(sharedMolecule(substrate), sharedMolecule(product))!;
			// The groups that survive, by the MCS: the text map must give each the same atoms.
			const surviving = unitAtoms(substrate).filter(
				(atom) => mcs.has(atom) && unitAtoms(product).includes(mcs.get(atom)!)
			);
			const text = byText(substrate, product, surviving);
			if (text === null) {
				return;
			} // left to the MCS: nothing to compare
			for (const atom of surviving) {
				expect(text.get(atom), `atom ${atom}`).toBe(mcs.get(atom));
			}
		});
	}

	it('maps the ten arms of the stress route by text (the MCS is not searched)', () => {
		const [a, b, c] = STRESS_ROUTE.intermediates.map((n) => n.structure) as [
			string,
			string,
			string
		];
		const units = (s: string) =>
			freeUnits(s)
				.filter((u) => u.id === 'ketone' || u.id === 'alcohol-primary')
				.flatMap((u) => u.atoms);
		expect(byText(a, b, units(a))).not.toBeNull();
		expect(byText(b, c, units(b))).not.toBeNull();
	});

	it('refuses when the shared text is not a common substructure, or misses a needed atom', () => {
		// Same text at both ends, but the ring closes elsewhere: the bonds among the paired atoms differ.
		expect(byText('C1CCCCC1O', 'C1CCC1CCO', [0, 1, 2, 3, 4, 5, 6])).toBeNull();
		// The ketone oxygen is written alike but bonded otherwise: it and its carbon are dropped.
		expect(byText('CC(=O)CCO', 'CC(O)CCO', [2])).toBeNull();
		expect(byText('CC(=O)CCO', 'CC(O)CCO', [4, 5])).toEqual(
			new Map([
				[0, 0],
				[3, 3],
				[4, 4],
				[5, 5]
			])
		);
		// A molfile is never read as text.
		const molfile = sharedMolecule('CCO').toMolfile();
		expect(byText(molfile, 'CCO', [])).toBeNull();
	});
});
