// The clash check with the oxygen PGs of issue 11 standing by: the finer classes and the
// reagent-level ratings of their rows decide, not the harshest member of a class. Explicit
// condition ids carry a class rating without a reagent, so they test the rows directly while the
// reagent rows move to finer classes. "Greene's" is Wuts, Greene's Protective Groups in Organic
// Synthesis, 5th ed.; "Kocienski" is Kocienski, Protecting Groups, 3rd ed. — from memory.

import { describe, expect, it } from 'vitest';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';

const rules = checkRulesFrom();
/** `severity subject` of each clash on the named PG, e.g. `['clash methyl-ether']`. */
const on = (subject: string, step: Omit<StepToCheck, 'id'>) =>
	checkStep(rules, { id: 'step', ...step })
		.clashes.filter((c) => c.subject === subject)
		.map((c) => `${c.severity} ${c.condition}`)
		.sort();

// Ethyl 4-hydroxybenzoate benzylated on the phenol; the ethyl ester stands by.
const PARABEN = { substrate: 'CCOC(=O)c1ccc(O)cc1', product: 'CCOC(=O)c1ccc(OCc2ccccc2)cc1' };

describe('ethyl ester', () => {
	it("stands by a carbonate alkylation in DMF, not a hydroxide — Greene's, ch. 5 (from memory)", () => {
		expect(
			on('ethyl-ester', { ...PARABEN, conditions: ['alkylating', 'base-aqueous-mild'] })
		).toEqual([]);
		expect(on('ethyl-ester', { ...PARABEN, conditions: ['alkylating', 'base-aqueous'] })).toEqual([
			'clash base-aqueous'
		]);
	});
	it("survives the hydride of a reductive amination but not LiAlH4 — Greene's, ch. 5 (from memory)", () => {
		const step = { substrate: 'CCOC(=O)CCC=O', product: 'CCOC(=O)CCCNCc1ccccc1' };
		expect(on('ethyl-ester', { ...step, conditions: ['hydride-mild-imine'] })).toEqual([]);
		expect(on('ethyl-ester', { ...step, conditions: ['hydride-mild'] })).toEqual([
			'caution hydride-mild'
		]);
		expect(on('ethyl-ester', { ...step, reagents: 'LiAlH4, THF' })).toEqual([
			'clash hydride-strong'
		]);
	});
});

describe('methyl ether', () => {
	// A MOM ether removed beside an aryl methyl ether.
	const step = { substrate: 'COc1ccc(CCOCOC)cc1', product: 'COc1ccc(CCO)cc1' };
	it('is cleaved by BBr3 and only flagged by TMSBr — McOmie, Tetrahedron 1968, 24, 2289 (from memory)', () => {
		expect(on('methyl-ether', { ...step, reagents: 'BBr3, CH2Cl2, –78 °C' })).toContain(
			'clash lewis-acid'
		);
		expect(on('methyl-ether', { ...step, reagents: 'TMSBr, CH2Cl2' })).toEqual([
			'caution lewis-acid'
		]);
	});
	it("stands by strong Brønsted acid and the Lewis acids of C–C bond formation — Greene's, ch. 3 (from memory)", () => {
		expect(on('methyl-ether', { ...step, reagents: 'HCl, MeOH' })).toEqual([]);
		expect(on('methyl-ether', { ...step, conditions: ['lewis-acid-mild'] })).toEqual([]);
		// A Mukaiyama aldol on an anisaldehyde: TiCl4 or BF3·OEt2 leave the aryl methyl ether.
		const aldol = { substrate: 'COc1ccc(C=O)cc1', product: 'COc1ccc(C(O)CC(=O)C)cc1' };
		expect(on('methyl-ether', { ...aldol, reagents: 'TiCl4, CH2Cl2, –78 °C' })).toEqual([]);
		expect(on('methyl-ether', { ...aldol, reagents: 'BF3·OEt2, CH2Cl2' })).toEqual([]);
	});
	it("is left by the DDQ that removes a PMB ether, only flagged by CAN — Greene's, ch. 2 (from memory)", () => {
		const pmb = { substrate: 'COc1ccc(CCOCc2ccc(OC)cc2)cc1', product: 'COc1ccc(CCO)cc1' };
		expect(on('methyl-ether', { ...pmb, reagents: 'DDQ, CH2Cl2/H2O' })).toEqual([]);
		expect(on('methyl-ether', { ...pmb, reagents: 'CAN, MeCN/H2O' })).toEqual([
			'caution oxidant-electron-transfer'
		]);
	});
});

describe('SEM and MEM ethers', () => {
	// A primary TBS ether removed beside a secondary SEM ether.
	const step = {
		substrate: 'CC(C)(C)[Si](C)(C)OCCC[C@@H](C)OCOCC[Si](C)(C)C',
		product: 'OCCC[C@@H](C)OCOCC[Si](C)(C)C'
	};
	it('SEM survives buffered fluoride that removes TBS, not forcing TBAF — Lipshutz & Pegram, Tetrahedron Lett. 1980, 21, 3343 (from memory)', () => {
		expect(on('SEM', { ...step, conditions: ['fluoride-buffered'] })).toEqual([]);
		expect(on('SEM', { ...step, conditions: ['fluoride'] })).toEqual(['clash fluoride']);
	});
	it("SEM falls to MgBr2 and is only flagged by TiCl4 — Greene's, ch. 2 (from memory)", () => {
		expect(on('SEM', { ...step, reagents: 'MgBr2·OEt2, Et2O' })).toEqual(['clash lewis-acid']);
		expect(on('SEM', { ...step, reagents: 'TiCl4, CH2Cl2' })).toEqual(['caution lewis-acid']);
	});
	it('MEM comes off with ZnBr2 where acetic acid in CH2Cl2 leaves it — Corey, Gras & Ulrich, Tetrahedron Lett. 1976, 17, 809 (from memory)', () => {
		const mem = { substrate: 'COCCOCOC1CCC(CC=O)CC1', product: 'COCCOCOC1CCC(CCNCc2ccccc2)CC1' };
		expect(on('MEM', { ...mem, conditions: ['acid-mild-aprotic'] })).toEqual([]);
		expect(on('MEM', { ...mem, reagents: 'ZnBr2, CH2Cl2' })).toEqual(['clash lewis-acid']);
	});
});

describe('allyl ether', () => {
	// Internal alkyne to cis-alkene beside an allyl ether.
	const step = { substrate: 'C=CCOCCC#CC', product: 'C=CCOCC/C=C\\C' };
	it('is only a caution under a poisoned catalyst, but is reduced by H2 over Pd/C — Guibé, Tetrahedron 1998, 54, 2967 (from memory)', () => {
		expect(on('allyl-ether', { ...step, conditions: ['hydrogenation-poisoned'] })).toEqual([
			'caution hydrogenation-poisoned'
		]);
		expect(on('allyl-ether', { ...step, reagents: 'H2, Pd/C, EtOH' })).toContain(
			'clash hydrogenation'
		);
	});
	it("is isomerised by KOtBu, not touched by NaH, and survives the DDQ that removes PMB — Greene's, ch. 2 (from memory)", () => {
		const ether = { substrate: 'C=CCOCCCCO', product: 'C=CCOCCCCOC' };
		expect(on('allyl-ether', { ...ether, reagents: 'KOtBu, THF; then MeI' })).toEqual([
			'clash base-strong'
		]);
		expect(on('allyl-ether', { ...ether, reagents: 'NaH, MeI, THF' })).toEqual([]);
		const pmb = { substrate: 'C=CCOCCCCOCc1ccc(OC)cc1', product: 'C=CCOCCCCO' };
		expect(on('allyl-ether', { ...pmb, reagents: 'DDQ, CH2Cl2/H2O' })).toEqual([]);
	});
});

describe('allyl ether, its alkene masked by the PG', () => {
	it('is flagged by the OsO4 that dihydroxylates another alkene — Guibé, Tetrahedron 1998, 54, 2967 (from memory)', () => {
		const step = {
			substrate: 'C=CCOCCCC/C=C/c1ccccc1',
			product: 'C=CCOCCCCC(O)C(O)c1ccccc1'
		};
		// OsO4 with NMO reads as the alkene oxidant class (rules/conditions.json).
		expect(on('allyl-ether', { ...step, reagents: 'OsO4, NMO, acetone/H2O' })).toContain(
			'clash oxidant-strong-alkene'
		);
		expect(on('allyl-ether', { ...step, conditions: ['oxidant-strong-alkene'] })).toEqual([
			'clash oxidant-strong-alkene'
		]);
	});
});

describe('tert-butyl ether', () => {
	it('stands by piperidine in Fmoc/tBu peptide synthesis and falls to TFA — Kocienski (from memory)', () => {
		const step = {
			substrate: 'CC(C)(C)OC[C@H](NC(=O)OCC1c2ccccc2-c2ccccc12)C(=O)OC',
			product: 'CC(C)(C)OC[C@H](N)C(=O)OC'
		};
		expect(on('tBu-ether', { ...step, reagents: '20% piperidine in DMF' })).toEqual([]);
		expect(on('tBu-ether', { ...step, reagents: 'TFA, CH2Cl2' })).toEqual(['clash acid-strong']);
	});
	it("survives an acid additive in an aprotic solvent — Greene's, ch. 2 (from memory)", () => {
		const step = { substrate: 'CC(C)(C)OCCCC=O', product: 'CC(C)(C)OCCCCNCc1ccccc1' };
		expect(on('tBu-ether', { ...step, conditions: ['acid-mild-aprotic'] })).toEqual([]);
		expect(on('tBu-ether', { ...step, conditions: ['acid-mild'] })).toEqual(['caution acid-mild']);
	});
});

describe('diol masks', () => {
	it('a PMP acetal is opened by DIBAL-H but only flagged by LiAlH4 — Johansson & Samuelsson, J. Chem. Soc., Chem. Commun. 1984, 201 (from memory)', () => {
		const step = {
			substrate: 'COc1ccc(C2OC[C@H](CCC(=O)OC)O2)cc1',
			product: 'COc1ccc(C2OC[C@H](CCCO)O2)cc1'
		};
		expect(on('PMP-acetal', { ...step, reagents: 'DIBAL-H, CH2Cl2' })).toEqual([
			'clash hydride-strong'
		]);
		expect(on('PMP-acetal', { ...step, reagents: 'LiAlH4, THF' })).toEqual([
			'caution hydride-strong'
		]);
	});
	it("a cyclic carbonate outlives the acid that removes an acetonide, not methanolic K2CO3 — Greene's, ch. 2 (from memory)", () => {
		const step = {
			substrate: 'O=C1OC[C@@H](C[C@@H]2COC(C)(C)O2)O1',
			product: 'O=C1OC[C@@H](C[C@@H](O)CO)O1'
		};
		expect(on('cyclic-carbonate', { ...step, reagents: '80% AcOH' })).toEqual([]);
		expect(on('cyclic-carbonate', { ...step, reagents: 'K2CO3, MeOH' })).toEqual([
			'clash base-aqueous'
		]);
		expect(on('cyclic-carbonate', { ...step, conditions: ['base-aqueous-mild'] })).toEqual([
			'caution base-aqueous-mild'
		]);
	});
	it("a DTBS or TIPDS bridge stands by the aqueous acid that removes a TBS ether, not fluoride — Greene's, ch. 2 (from memory)", () => {
		const dtbs = {
			substrate: 'CC(C)(C)[Si]1(C(C)(C)C)OCC[C@@H](CCO[Si](C)(C)C(C)(C)C)O1',
			product: 'CC(C)(C)[Si]1(C(C)(C)C)OCC[C@@H](CCO)O1'
		};
		expect(on('DTBS', { ...dtbs, reagents: 'AcOH/THF/H2O' })).toEqual([]);
		expect(on('DTBS', { ...dtbs, reagents: 'TBAF, THF' })).toEqual(['clash fluoride']);
		// Dihydroxylation or epoxidation elsewhere spares a silylene; chromic acid is only a caution.
		expect(on('DTBS', { ...dtbs, conditions: ['oxidant-strong-alkene'] })).toEqual([]);
		expect(on('DTBS', { ...dtbs, conditions: ['oxidant-strong'] })).toEqual([
			'caution oxidant-strong'
		]);
		const tipds = {
			substrate: 'CC(C)[Si]1(C(C)C)OCC[C@@H](CCOC(=O)C)O[Si](C(C)C)(C(C)C)O1',
			product: 'CC(C)[Si]1(C(C)C)OCC[C@@H](CCO)O[Si](C(C)C)(C(C)C)O1'
		};
		expect(on('TIPDS', { ...tipds, conditions: ['base-aqueous-mild'] })).toEqual([]);
		expect(on('TIPDS', { ...tipds, reagents: 'LiOH, THF/H2O' })).toEqual(['caution base-aqueous']);
	});
});

describe('PMB ester', () => {
	it("is only a caution under the DDQ that removes a PMB ether, and falls to TFA — Greene's, ch. 5 (from memory)", () => {
		const step = {
			substrate: 'COc1ccc(COC(=O)CC[C@@H](C)OCc2ccc(OC)cc2)cc1',
			product: 'COc1ccc(COC(=O)CC[C@@H](C)O)cc1'
		};
		expect(on('PMB-ester', { ...step, reagents: 'DDQ, CH2Cl2/H2O' })).toEqual([
			'caution oxidant-electron-transfer'
		]);
		expect(on('PMB-ester', { ...step, reagents: 'TFA, CH2Cl2' })).toEqual(['clash acid-strong']);
	});
});
