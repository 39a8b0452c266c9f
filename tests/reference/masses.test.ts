// Molar masses against outside values: common reagents against handbook figures, and every
// reference molecule against a sum over IUPAC standard atomic weights.

import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { formulaOf, molarMassOf } from '../../src/lib/chem/properties';
import { referenceMolecules } from './molecules';

// Molar masses in g/mol, CRC Handbook of Chemistry and Physics (physical constants of organic
// compounds table), from memory. Our figure must be within 0.01 g/mol (rounding to 2 decimals and
// small differences between atomic-weight editions).
const REAGENTS: [name: string, smiles: string, formula: string, handbook: number][] = [
	['water', 'O', 'H2O', 18.02],
	['methanol', 'CO', 'CH4O', 32.04],
	['ethanol', 'CCO', 'C2H6O', 46.07],
	['acetone', 'CC(C)=O', 'C3H6O', 58.08],
	['acetic acid', 'CC(=O)O', 'C2H4O2', 60.05],
	['ethylene glycol', 'OCCO', 'C2H6O2', 62.07],
	['imidazole', 'c1c[nH]cn1', 'C3H4N2', 68.08],
	['tetrahydrofuran', 'C1CCOC1', 'C4H8O', 72.11],
	['N,N-dimethylformamide', 'CN(C)C=O', 'C3H7NO', 73.09],
	['pyridine', 'c1ccncc1', 'C5H5N', 79.1],
	['dichloromethane', 'ClCCl', 'CH2Cl2', 84.93],
	['toluene', 'Cc1ccccc1', 'C7H8', 92.14],
	['triethylamine', 'CCN(CC)CC', 'C6H15N', 101.19],
	['2,2-dimethoxypropane', 'COC(C)(C)OC', 'C5H12O2', 104.15],
	['trifluoroacetic acid', 'OC(=O)C(F)(F)F', 'C2HF3O2', 114.02],
	['chloroform', 'ClC(Cl)Cl', 'CHCl3', 119.38],
	['4-(dimethylamino)pyridine', 'CN(C)c1ccncc1', 'C7H10N2', 122.17],
	['tert-butyldimethylsilyl chloride', 'CC(C)(C)[Si](C)(C)Cl', 'C6H15ClSi', 150.72],
	['benzyl bromide', 'BrCc1ccccc1', 'C7H7Br', 171.04],
	['p-toluenesulfonic acid', 'Cc1ccc(cc1)S(=O)(=O)O', 'C7H8O3S', 172.2],
	['N,N′-dicyclohexylcarbodiimide', 'C1CCC(CC1)N=C=NC1CCCCC1', 'C13H22N2', 206.33],
	['di-tert-butyl dicarbonate', 'CC(C)(C)OC(=O)OC(=O)OC(C)(C)C', 'C10H18O5', 218.25]
];

describe('molar masses of common reagents (CRC Handbook of Chemistry and Physics, from memory)', () => {
	it.each(REAGENTS)('%s %s', (_name, smiles, formula, handbook) => {
		const { molecule } = readStructure(smiles);
		expect(formulaOf(molecule)).toBe(formula);
		expect(Math.abs(molarMassOf(molecule) - handbook)).toBeLessThanOrEqual(0.011);
	});
});

// IUPAC standard atomic weights, abridged to five significant figures (IUPAC Commission on
// Isotopic Abundances and Atomic Weights, 2021 table), from memory.
const IUPAC: Record<string, number> = {
	H: 1.008,
	B: 10.81,
	C: 12.011,
	N: 14.007,
	O: 15.999,
	F: 18.998,
	Si: 28.085,
	P: 30.974,
	S: 32.06,
	Cl: 35.45,
	Br: 79.904,
	I: 126.9
};

function massFromFormula(formula: string): number {
	let mass = 0;
	for (const [, element, count] of formula
		.replace(/\d*[+-]$/, '')
		.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
		const weight = IUPAC[element!];
		if (weight === undefined) {
			throw new Error(`no atomic weight for ${element}`);
		}
		mass += weight * (count ? Number(count) : 1);
	}
	return mass;
}

describe('every reference molecule weighs what its formula says (IUPAC standard atomic weights)', () => {
	it.each(referenceMolecules)('$name', ({ smiles }) => {
		const { molecule } = readStructure(smiles);
		// 0.02 g/mol allows for the abridged weights over up to ~60 atoms.
		expect(Math.abs(molarMassOf(molecule) - massFromFormula(formulaOf(molecule)))).toBeLessThan(
			0.02
		);
	});
});
