import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Silyl, benzyl-type, acetal-type and trityl ethers, esters as alcohol protection, diol protection.
export const oxygenProtection: ReferenceMolecule[] = [
	// Silyl ethers and alkynes
	{ name: 'OG-2031-01 TBS aldehyde', smiles: 'CC(C)(C)[Si](C)(C)OCCCC=O', pgs: ['TBS'] },
	{
		name: 'OG-2031-02 TBDPS diol half',
		smiles: 'CC(C)(C)[Si](c1ccccc1)(c1ccccc1)OCC[C@H](O)C',
		pgs: ['TBDPS']
	},
	{
		name: 'OG-2031-03 TIPS benzyl bromide',
		smiles: 'CC(C)[Si](C(C)C)(C(C)C)OCc1ccc(Br)cc1',
		pgs: ['TIPS']
	},
	{
		name: 'OG-2031-04 TES cyclohexyl ester',
		smiles: 'CC[Si](CC)(CC)OC1CCCCC1C(=O)OC',
		pgs: ['TES', 'methyl-ester']
	},
	{ name: 'OG-2031-05 TMS propargylic ether', smiles: 'C[Si](C)(C)OC(C)(C)C#C', pgs: ['TMS'] },
	{ name: 'OG-2031-06 TMS alkyne alcohol', smiles: 'C[Si](C)(C)C#CCCO', pgs: ['TMS-alkyne'] },
	{
		name: 'OG-2031-07 TBS cyclohexanone',
		smiles: 'O=C1CC[C@@H](O[Si](C)(C)C(C)(C)C)CC1',
		pgs: ['TBS']
	},
	{ name: 'OG-2031-08 TBS phenol', smiles: 'CC(C)(C)[Si](C)(C)Oc1ccc(C=O)cc1', pgs: ['TBS'] },
	// Benzyl-type, acetal-type and trityl ethers
	{ name: 'OG-2044-01 Bn allylic ether', smiles: 'OCC[C@@H](OCc1ccccc1)C=C', pgs: ['Bn'] },
	{ name: 'OG-2044-02 PMB aldehyde', smiles: 'COc1ccc(COC[C@H](C)CC=O)cc1', pgs: ['PMB'] },
	{ name: 'OG-2044-03 MOM phenol aldehyde', smiles: 'COCOc1ccc(C=O)cc1', pgs: ['MOM'] },
	{ name: 'OG-2044-04 THP alkynol', smiles: 'C#CCCCOC1CCCCO1', pgs: ['THP'] },
	{
		name: 'OG-2044-05 trityl glycerol',
		smiles: 'OCC(O)COC(c1ccccc1)(c1ccccc1)c1ccccc1',
		pgs: ['Tr']
	},
	{
		name: 'OG-2044-06 Bn and PMB diether',
		smiles: 'COc1ccc(COCCCCOCc2ccccc2)cc1',
		pgs: ['PMB', 'Bn']
	},
	{
		name: 'OG-2044-07 Bn phenol ether',
		smiles: 'O=Cc1ccc(OCc2ccccc2)c(OC)c1',
		pgs: ['Bn', 'methyl-ether']
	},
	// Esters as alcohol protection
	{
		name: 'OG-3107-01 6-O-acetyl pyranose',
		smiles: 'CC(=O)OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O',
		pgs: ['Ac']
	},
	{
		name: 'OG-3107-02 Bz aminocyclohexanol',
		smiles: 'O=C(O[C@@H]1CC[C@H](CC1)N)c1ccccc1',
		pgs: ['Bz']
	},
	{ name: 'OG-3107-03 Piv allylic diol', smiles: 'CC(C)(C)C(=O)OCC/C=C/CO', pgs: ['Piv'] },
	{ name: 'OG-3107-04 acetyl phenol', smiles: 'CC(=O)Oc1ccc(CC(=O)O)cc1', pgs: ['Ac'] },
	// Diol protection
	{ name: 'OG-3107-05 acetonide 1,2', smiles: 'CC1(C)OC[C@@H](CCO)O1', pgs: ['acetonide'] },
	{
		name: 'OG-3107-06 acetonide 1,3',
		smiles: 'CC1(C)O[C@@H](C)C[C@H](CC=O)O1',
		pgs: ['acetonide']
	},
	{ name: 'OG-3107-07 benzylidene triol', smiles: 'OC1COC(c2ccccc2)OC1', pgs: ['benzylidene'] },
	{
		name: 'OG-3107-08 benzylidene glucoside',
		smiles: 'CO[C@@H]1O[C@@H]2COC(c3ccccc3)O[C@H]2[C@H](O)[C@H]1O',
		pgs: ['benzylidene']
	}
];
