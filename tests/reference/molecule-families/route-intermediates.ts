import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Multi-PG route intermediates.
export const routeIntermediates: ReferenceMolecule[] = [
	// Multi-PG route intermediates
	{
		name: 'OG-2031-20 furanoside TBS Bn',
		smiles: 'CC(C)(C)[Si](C)(C)OC[C@H]1O[C@@H](OC)[C@H](OCc2ccccc2)[C@@H]1O',
		pgs: ['TBS', 'Bn']
	},
	{
		name: 'OG-2031-21 acetonide dioxolane side chain',
		smiles: 'CC1(CC[C@H]2COC(C)(C)O2)OCCO1',
		pgs: ['dioxolane', 'acetonide']
	},
	{
		name: 'OG-2044-21 TBDPS Boc amino ester',
		smiles: 'CC(C)(C)OC(=O)N[C@@H](CO[Si](c1ccccc1)(c1ccccc1)C(C)(C)C)C(=O)OCC=C',
		pgs: ['Boc', 'TBDPS', 'allyl-ester']
	},
	{
		name: 'OG-3107-20 PMB MOM lactone',
		smiles: 'COCO[C@H]1C[C@@H](COCc2ccc(OC)cc2)OC1=O',
		pgs: ['MOM', 'PMB']
	},
	{
		name: 'OG-3107-21 Fmoc Tr serine tBu',
		smiles: 'O=C(N[C@@H](COC(c1ccccc1)(c1ccccc1)c1ccccc1)C(=O)OC(C)(C)C)OCC1c2ccccc2-c2ccccc21',
		pgs: ['Fmoc', 'Tr', 'tBu-ester']
	},
	{
		name: 'OG-3107-22 TIPS THP epoxide',
		smiles: 'CC(C)[Si](C(C)C)(C(C)C)OC[C@H]1O[C@@H]1CCOC1CCCCO1',
		pgs: ['TIPS', 'THP']
	},
	{
		name: 'OG-3107-23 Bz Piv nitrile',
		smiles: 'N#CC[C@H](OC(=O)c1ccccc1)COC(=O)C(C)(C)C',
		pgs: ['Bz', 'Piv']
	},
	{
		name: 'OG-3107-24 TES TMS-alkyne',
		smiles: 'CC[Si](CC)(CC)O[C@@H](C)C#C[Si](C)(C)C',
		pgs: ['TES', 'TMS-alkyne']
	}
];
