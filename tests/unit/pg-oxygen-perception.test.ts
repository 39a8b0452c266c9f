// Perception of the oxygen protecting groups of issue 11, each on a real compound or a textbook
// example (source beside it), each with a near miss that must not be read as that PG.
// "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed.; structures are
// common practice, recalled rather than read ("from memory").

import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { perceive } from '../../src/lib/chem/perceive';

const pgsOf = (smiles: string) =>
	perceive(readStructure(smiles).molecule)
		.protectingGroups.map((pg) => `${pg.id}:${pg.masks}`)
		.sort();

const FMOC_NH = 'NC(=O)OCC1c2ccccc2-c2ccccc12';

describe('each oxygen PG is found on a real compound, masking the right group', () => {
	it.each([
		// 4-Methoxyphenol (mequinol): an aryl methyl ether beside a free phenol — common practice.
		['COc1ccc(O)cc1', ['methyl-ether:phenol']],
		// Allyl phenyl ether, the textbook Claisen rearrangement substrate — Clayden, Organic
		// Chemistry, 2nd ed., pericyclic rearrangements (from memory).
		['C=CCOc1ccccc1', ['allyl-ether:phenol']],
		// 1-Octyl SEM ether — Lipshutz & Pegram, Tetrahedron Lett. 1980, 21, 3343 (from memory).
		['CCCCCCCCOCOCC[Si](C)(C)C', ['SEM:alcohol-primary']],
		// Cyclohexyl MEM ether — Corey, Gras & Ulrich, Tetrahedron Lett. 1976, 17, 809 (from memory).
		['COCCOCOC1CCCCC1', ['MEM:alcohol-secondary']],
		// BOM ether of 4-hydroxybutanal — Greene's, ch. 2, benzyloxymethyl ethers (from memory).
		['O=CCCCOCOCc1ccccc1', ['BOM:alcohol-primary']],
		// Fmoc-Ser(tBu)-OH and Fmoc-Tyr(tBu)-OH, building blocks of Fmoc/tBu peptide synthesis —
		// Kocienski, Protecting Groups, 3rd ed. (from memory).
		[`CC(C)(C)OC[C@H](${FMOC_NH})C(=O)O`, ['Fmoc:amine-primary', 'tBu-ether:alcohol-primary']],
		[`CC(C)(C)Oc9ccc(C[C@H](${FMOC_NH})C(=O)O)cc9`, ['Fmoc:amine-primary', 'tBu-ether:phenol']],
		// 3',5'-O-TIPDS-uridine — Markiewicz, J. Chem. Res. (S) 1979, 24 (from memory).
		[
			'CC(C)[Si]1(C(C)C)OC[C@H]2O[C@@H](n3ccc(=O)[nH]c3=O)[C@H](O)[C@@H]2O[Si](C(C)C)(C(C)C)O1',
			['TIPDS:diol-1,3']
		],
		// Methyl 4,6-O-di-tert-butylsilylene-α-D-glucopyranoside — Greene's, ch. 2 (from memory).
		['CO[C@H]1O[C@@H]2CO[Si](C(C)(C)C)(C(C)(C)C)O[C@H]2[C@H](O)[C@H]1O', ['DTBS:diol-1,3']],
		// Methyl 4,6-O-(4-methoxybenzylidene)-α-D-glucopyranoside — Greene's, ch. 2 (from memory).
		['CO[C@H]1O[C@@H]2CO[C@@H](c3ccc(OC)cc3)O[C@H]2[C@H](O)[C@H]1O', ['PMP-acetal:diol-1,3']],
		// Glycerol 1,2-carbonate and trimethylene carbonate — common practice.
		['O=C1OC[C@@H](CO)O1', ['cyclic-carbonate:diol-1,2']],
		['O=C1OCCCO1', ['cyclic-carbonate:diol-1,3']],
		// Benzocaine (ethyl 4-aminobenzoate) — common practice.
		['CCOC(=O)c1ccc(N)cc1', ['ethyl-ester:carboxylic-acid']],
		// A PMB ester beside a PMB ether in one molecule — Greene's, ch. 5 (from memory).
		[
			'COc1ccc(COC(=O)CC[C@@H](O)COCc2ccc(OC)cc2)cc1',
			['PMB-ester:carboxylic-acid', 'PMB:alcohol-primary']
		]
	])('%s → %j', (smiles, expected) => {
		expect(pgsOf(smiles)).toEqual([...expected].sort());
	});
});

describe('near misses are not read as the new PGs', () => {
	it.each([
		// The OMe of a methyl ester, a methyl glycoside, a dimethyl acetal and a PMB ether is not
		// a methyl ether: removing the methyl would free no alcohol or phenol of its own.
		['COC(=O)c1ccc(O)cc1', ['methyl-ester:carboxylic-acid']],
		['COC1OC(CO)C(O)C1O', []],
		['COC(OC)CCO', ['dimethyl-acetal:aldehyde']],
		['COc1ccc(COCCO)cc1', ['PMB:alcohol-primary']],
		// An allyl ester is an allyl ester; a crotyl ether has no terminal alkene.
		['C=CCOC(=O)CCO', ['allyl-ester:carboxylic-acid']],
		['CC/C=C/COCCO', []],
		// A 2-(trimethylsilyl)ethyl ether lacks SEM's acetal; SEM and MEM are not also MOM.
		['C[Si](C)(C)CCOCCCO', []],
		['COCOCCCO', ['MOM:alcohol-primary']],
		// BOM is not a benzyl ether; a tert-butyl ester and Boc are not tert-butyl ethers; a
		// tert-amyl ether is none of them.
		['OCCOCc1ccccc1', ['Bn:alcohol-primary']],
		['CC(C)(C)OC(=O)CCO', ['tBu-ester:carboxylic-acid']],
		['CC(C)(C)OC(=O)NCCO', ['Boc:amine-primary']],
		['CCC(C)(C)OCCO', []],
		// A TIPS or TBS ether is not a bridging silylene.
		['CC(C)[Si](C(C)C)(C(C)C)OCCC[C@@H](C)O', ['TIPS:alcohol-primary']],
		['CC(C)(C)[Si](C)(C)OCC[C@@H](C)O', ['TBS:alcohol-primary']],
		// The plain benzylidene is not a PMP acetal.
		['CO[C@H]1O[C@@H]2CO[C@@H](c3ccccc3)O[C@H]2[C@H](O)[C@H]1O', ['benzylidene:diol-1,3']],
		// A cyclic carbamate and an acyclic carbonate are not cyclic carbonates.
		['O=C1OC[C@@H](CO)N1', []],
		['CCOC(=O)OCCO', []],
		// A propyl ester and ethyl carbamate are not ethyl esters.
		['CCCOC(=O)CCO', []],
		['CCOC(=O)NCCO', []]
	])('%s → %j', (smiles, expected) => {
		expect(pgsOf(smiles)).toEqual([...expected].sort());
	});

	it('MEM and SEM are one PG each, not also MOM or a methyl ether', () => {
		expect(pgsOf('COCCOCOC1CCCCC1')).toEqual(['MEM:alcohol-secondary']);
		expect(pgsOf('C[Si](C)(C)CCOCOCCCC=O')).toEqual(['SEM:alcohol-primary']);
		expect(pgsOf('O=CCCCOCOCc1ccccc1')).toEqual(['BOM:alcohol-primary']);
	});
});
