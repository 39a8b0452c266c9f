import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Carbonyl, amine, acid and thiol protection.
export const carbonylAmineAcidThiol: ReferenceMolecule[] = [
	// Carbonyl protection
	{
		name: 'OG-2031-10 dioxolane keto ester',
		smiles: 'CC1(CCC(=O)OC)OCCO1',
		pgs: ['dioxolane', 'methyl-ester']
	},
	{ name: 'OG-2031-11 dioxane aldehyde acid', smiles: 'OC(=O)CCC1OCCCO1', pgs: ['dioxane'] },
	{ name: 'OG-2031-12 dithiane aldehyde', smiles: 'OCCCC1SCCCS1', pgs: ['dithiane'] },
	{ name: 'OG-2031-13 dithiane ketone', smiles: 'CC1(CCO)SCCCS1', pgs: ['dithiane'] },
	{
		name: 'OG-2031-14 dimethyl acetal ketone',
		smiles: 'COC(OC)CCC(=O)c1ccccc1',
		pgs: ['dimethyl-acetal']
	},
	{
		name: 'OG-2031-15 dioxolane diol (side chain)',
		smiles: 'CC1(CC[C@@H](O)CO)OCCO1',
		pgs: ['dioxolane']
	},
	// Amine protection
	{
		name: 'OG-2044-10 Boc amino ester',
		smiles: 'CC(C)(C)OC(=O)N[C@@H](Cc1ccccc1)C(=O)OC',
		pgs: ['Boc', 'methyl-ester']
	},
	{
		name: 'OG-2044-11 Boc piperidine methanol',
		smiles: 'CC(C)(C)OC(=O)N1CCC(CO)CC1',
		pgs: ['Boc']
	},
	{ name: 'OG-2044-12 Cbz lysine', smiles: 'O=C(OCc1ccccc1)NCCCC[C@H](N)C(=O)O', pgs: ['Cbz'] },
	{
		name: 'OG-2044-13 Fmoc alanine',
		smiles: 'O=C(OCC1c2ccccc2-c2ccccc21)N[C@@H](C)C(=O)O',
		pgs: ['Fmoc']
	},
	{ name: 'OG-2044-14 Alloc tryptamine', smiles: 'C=CCOC(=O)NCCc1c[nH]c2ccccc12', pgs: ['Alloc'] },
	{
		name: 'OG-2044-15 Ts cyclopropylmethylamine',
		smiles: 'Cc1ccc(cc1)S(=O)(=O)NCC1CC1',
		pgs: ['Ts']
	},
	{ name: 'OG-2044-16 N-Ts indole', smiles: 'Cc1ccc(cc1)S(=O)(=O)n1ccc2ccccc21', pgs: ['Ts'] },
	{
		name: 'OG-2044-17 phthalimido bromide',
		smiles: 'O=C1c2ccccc2C(=O)N1CCCBr',
		pgs: ['phthalimide']
	},
	{ name: 'OG-2044-18 Boc indole', smiles: 'CC(C)(C)OC(=O)n1ccc2cc(CO)ccc21', pgs: ['Boc'] },
	{
		name: 'OG-2044-19 Boc amino alcohol TBS',
		smiles: 'CC(C)(C)OC(=O)NCC[C@H](C)O[Si](C)(C)C(C)(C)C',
		pgs: ['Boc', 'TBS']
	},
	{ name: 'OG-2044-20 Cbz piperazine', smiles: 'O=C(OCc1ccccc1)N1CCNCC1', pgs: ['Cbz'] },
	// Acid protection
	{
		name: 'OG-3107-10 methyl hydroxybenzoate',
		smiles: 'COC(=O)c1ccc(O)cc1',
		pgs: ['methyl-ester']
	},
	{
		name: 'OG-3107-11 tBu glutamate',
		smiles: 'CC(C)(C)OC(=O)CC[C@H](N)C(=O)O',
		pgs: ['tBu-ester']
	},
	{ name: 'OG-3107-12 Bn hemisuccinate', smiles: 'O=C(OCc1ccccc1)CCC(=O)O', pgs: ['Bn-ester'] },
	{
		name: 'OG-3107-13 allyl ester Boc proline',
		smiles: 'C=CCOC(=O)[C@@H]1CCCN1C(=O)OC(C)(C)C',
		pgs: ['allyl-ester', 'Boc']
	},
	{
		name: 'OG-3107-14 Bn ester Bn ether',
		smiles: 'O=C(OCc1ccccc1)C[C@@H](OCc1ccccc1)C',
		pgs: ['Bn-ester', 'Bn']
	},
	{
		name: 'OG-3107-15 Boc-Ala-Gly-OBn',
		smiles: 'C[C@H](NC(=O)OC(C)(C)C)C(=O)NCC(=O)OCc1ccccc1',
		pgs: ['Boc', 'Bn-ester']
	},
	// Thiols
	{
		name: 'OG-3107-16 S-trityl cysteine',
		smiles: 'N[C@@H](CSC(c1ccccc1)(c1ccccc1)c1ccccc1)C(=O)O',
		pgs: ['S-Tr']
	},
	{ name: 'OG-3107-17 free thiol amino acid', smiles: 'SCC[C@H](N)C(=O)O' }
];
