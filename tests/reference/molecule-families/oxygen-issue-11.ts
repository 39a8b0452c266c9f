import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Oxygen protecting groups of issue 11.
export const oxygenIssue11: ReferenceMolecule[] = [
	// Oxygen protecting groups of issue 11
	{ name: 'OG-5120-01 allyloxy benzaldehyde', smiles: 'C=CCOc1ccc(C=O)cc1', pgs: ['allyl-ether'] },
	{ name: 'OG-5120-02 SEM hydroxy aldehyde', smiles: 'C[Si](C)(C)CCOCOCCCC=O', pgs: ['SEM'] },
	{ name: 'OG-5120-03 MEM cyclohexanone', smiles: 'COCCOCO[C@@H]1CCCCC1=O', pgs: ['MEM'] },
	{ name: 'OG-5120-04 BOM aldehyde', smiles: 'O=CCCCOCOCc1ccccc1', pgs: ['BOM'] },
	{
		name: 'OG-5120-05 O-tert-butyl serine',
		smiles: 'CC(C)(C)OC[C@@H](N)C(=O)O',
		pgs: ['tBu-ether']
	},
	{
		name: 'OG-5120-06 TIPDS butanediol',
		smiles: 'C[C@@H]1CCO[Si](C(C)C)(C(C)C)O[Si](C(C)C)(C(C)C)O1',
		pgs: ['TIPDS']
	},
	{
		name: 'OG-5120-07 DTBS pentenediol',
		smiles: 'CC(C)(C)[Si]1(C(C)(C)C)OC[C@@H](CC=C)O1',
		pgs: ['DTBS']
	},
	{
		name: 'OG-5120-08 PMP acetal alcohol',
		smiles: 'COc1ccc(C2OC[C@H](CCO)O2)cc1',
		pgs: ['PMP-acetal']
	},
	{
		name: 'OG-5120-09 glycerol carbonate',
		smiles: 'O=C1OC[C@@H](CO)O1',
		pgs: ['cyclic-carbonate']
	},
	{ name: 'OG-5120-10 ethyl hydroxybenzoate', smiles: 'CCOC(=O)c1ccc(O)cc1', pgs: ['ethyl-ester'] },
	{ name: 'OG-5120-11 PMB ester aldehyde', smiles: 'COc1ccc(COC(=O)CCC=O)cc1', pgs: ['PMB-ester'] },
	{ name: 'OG-5120-12 methyl ether alkenol', smiles: 'CO[C@@H](CC=C)CCO', pgs: ['methyl-ether'] }
];
