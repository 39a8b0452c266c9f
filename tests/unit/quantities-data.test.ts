// The physical data behind the quantities engine: molar masses in rules/reagents.json against
// openchemlib and RDKit, spot-checked densities and boiling points, and rules/azeotropes.json.

import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { molarMassOf } from '../../src/lib/chem/properties';
import { lookupReagent } from '../../src/lib/quantities/dictionary';
import { loadAzeotropes, parseAzeotropes } from '../../src/lib/rules/azeotropes';
import { RuleTableError } from '../../src/lib/rules/issues';
import { parseRuleFiles } from '../../src/lib/rules/validate';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { rdkit } from '../reference/rdkit';

// Dictionary rows with a structure; the molar mass in the file must match both toolkits.
const STRUCTURES: [name: string, smiles: string][] = [
	['ethylene glycol', 'OCCO'],
	['1,3-propanediol', 'OCCCO'],
	['methanol', 'CO'],
	['ethanol', 'CCO'],
	['trimethyl orthoformate', 'COC(OC)OC'],
	['triethyl orthoformate', 'CCOC(OCC)OCC'],
	['2,2-dimethoxypropane', 'COC(C)(C)OC'],
	['acetone', 'CC(C)=O'],
	['DHP', 'C1CC=COC1'],
	['TBSCl', 'CC(C)(C)[Si](C)(C)Cl'],
	['TBSOTf', 'CC(C)(C)[Si](C)(C)OS(=O)(=O)C(F)(F)F'],
	['TMSCl', 'C[Si](C)(C)Cl'],
	['TESCl', 'CC[Si](CC)(CC)Cl'],
	['TIPSCl', 'CC(C)[Si](C(C)C)(C(C)C)Cl'],
	['imidazole', 'c1c[nH]cn1'],
	['pyridine', 'c1ccncc1'],
	['2,6-lutidine', 'Cc1cccc(C)n1'],
	['Et3N', 'CCN(CC)CC'],
	['DIPEA', 'CCN(C(C)C)C(C)C'],
	['DMAP', 'CN(C)c1ccncc1'],
	['p-TsOH·H2O', 'Cc1ccc(cc1)S(=O)(=O)O.O'],
	['PPTS', 'Cc1ccc(cc1)S(=O)(=O)[O-].c1cc[nH+]cc1'],
	['CSA', 'CC1(C)C2CCC1(CS(=O)(=O)O)C(=O)C2'],
	['AcOH', 'CC(=O)O'],
	['Ac2O', 'CC(=O)OC(C)=O'],
	['BnBr', 'BrCc1ccccc1'],
	['MOMCl', 'COCCl'],
	['Boc2O', 'CC(C)(C)OC(=O)OC(=O)OC(C)(C)C'],
	['TFA', 'OC(=O)C(F)(F)F'],
	['toluene', 'Cc1ccccc1'],
	['benzene', 'c1ccccc1'],
	['cyclohexane', 'C1CCCCC1'],
	['heptane', 'CCCCCCC'],
	['chloroform', 'ClC(Cl)Cl'],
	['dichloromethane', 'ClCCl'],
	['1,2-dichloroethane', 'ClCCCl'],
	['ethyl acetate', 'CCOC(C)=O'],
	['carbon tetrachloride', 'ClC(Cl)(Cl)Cl']
];

describe('molar masses in rules/reagents.json', () => {
	it.each(STRUCTURES)(
		'%s matches openchemlib and RDKit within 0.02 g/mol',
		async (name, smiles) => {
			const entry = lookupReagent(name);
			expect(entry?.molarMass, name).toBeDefined();
			const ocl = molarMassOf(readStructure(smiles).molecule);
			const mol = (await rdkit()).get_mol(smiles)!;
			const amw = (JSON.parse(mol.get_descriptors()) as { amw: number }).amw;
			mol.delete();
			expect(Math.abs(entry!.molarMass! - ocl)).toBeLessThan(0.02);
			expect(Math.abs(entry!.molarMass! - amw)).toBeLessThan(0.02);
		}
	);
});

// Spot checks, CRC Handbook of Chemistry and Physics, physical constants of organic compounds
// (from memory): density g/mL at 20 °C and normal boiling point °C.
const HANDBOOK: [name: string, density: number, boilingPoint: number][] = [
	['ethylene glycol', 1.1135, 197.3],
	['toluene', 0.8668, 110.6],
	['benzene', 0.8765, 80.1],
	['pyridine', 0.9819, 115.2],
	['acetic acid', 1.0492, 117.9],
	['dichloromethane', 1.3266, 39.6],
	['ethanol', 0.7893, 78.3]
];

describe('densities and boiling points (CRC Handbook, from memory)', () => {
	it.each(HANDBOOK)('%s', (name, density, boilingPoint) => {
		const entry = lookupReagent(name)!;
		expect(Math.abs(entry.density! - density)).toBeLessThan(0.002);
		expect(Math.abs(entry.boilingPoint! - boilingPoint)).toBeLessThan(0.5);
		expect(entry.physicalSource).toMatch(/CRC Handbook/);
	});

	it('finds rows by synonym, case-insensitively, but not an isotopologue (CDCl3 is heavier)', () => {
		expect(lookupReagent('Ethylene Glycol')?.name).toBe('ethylene glycol');
		expect(lookupReagent('PhMe')?.name).toBe('toluene');
		expect(lookupReagent('CDCl3')).toBeUndefined();
		expect(lookupReagent('D2O')).toBeUndefined();
	});

	it('refuses a figure without a source at load', () => {
		const reagents = structuredClone(DEFAULT_RULE_FILES.reagents) as Record<string, unknown>[];
		const row = reagents.find((r) => r.name === 'toluene')!;
		delete row.physicalSource;
		expect(() => parseRuleFiles({ ...DEFAULT_RULE_FILES, reagents })).toThrow(
			/physical data needs a source/
		);
	});
});

describe('rules/azeotropes.json', () => {
	const rows = loadAzeotropes();
	const byId = (id: string) => rows.find((row) => row.id === id)!;

	it('has at least 8 solvents, at least one denser than water (water the upper layer)', () => {
		expect(rows.length).toBeGreaterThanOrEqual(8);
		const upper = rows.filter((row) => row.waterLayer === 'upper').map((row) => row.id);
		expect(upper).toEqual(expect.arrayContaining(['chloroform', '1,2-dichloroethane']));
	});

	// Common practice: toluene–water ≈ 84–85 °C with about a fifth water; benzene ≈ 69 °C, ≈ 9 %;
	// cyclohexane ≈ 69–70 °C, 8–9 % (CRC azeotrope tables / Horsley, from memory).
	it.each([
		['toluene', 84, 85, 18, 22, 'lower'],
		['benzene', 68.5, 69.5, 8, 9.5, 'lower'],
		['cyclohexane', 69, 70, 8, 9, 'lower'],
		['chloroform', 55.5, 56.5, 2, 3.5, 'upper']
	] as const)('%s', (id, bpLow, bpHigh, waterLow, waterHigh, layer) => {
		const row = byId(id);
		expect(row.boilingPoint).toBeGreaterThanOrEqual(bpLow);
		expect(row.boilingPoint).toBeLessThanOrEqual(bpHigh);
		expect(row.waterMassPercent).toBeGreaterThanOrEqual(waterLow);
		expect(row.waterMassPercent).toBeLessThanOrEqual(waterHigh);
		expect(row.waterLayer).toBe(layer);
		expect(row.source).toMatch(/CRC|Horsley/);
	});

	it('solvent densities agree with the reagent dictionary', () => {
		for (const row of rows) {
			const entry = lookupReagent(row.name.replace(/ \(.*\)$/, ''));
			expect(entry?.density, row.id).toBeCloseTo(row.solventDensity, 3);
		}
	});

	it('refuses a row whose water layer contradicts the density, naming the file and row', () => {
		const bad = [{ ...byId('chloroform'), waterLayer: 'lower' }];
		expect(() => parseAzeotropes(bad)).toThrow(RuleTableError);
		expect(() => parseAzeotropes(bad)).toThrow(
			/rules\/azeotropes\.json: \[0\]\.waterLayer|waterLayer/
		);
		expect(() => parseAzeotropes([{ ...byId('toluene'), boilingPoint: 120 }])).toThrow(
			/boils below the solvent/
		);
	});
});
