import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Issue 11 groups: each new group, and the near misses that must not be reported as it.
export const groupsIssue11: ReferenceMolecule[] = [
	// Issue 11 groups: each new group, and the near misses that must not be reported as it
	{ name: 'OG-5230-01 bromo fluoro anisole', smiles: 'COc1ccc(Br)cc1F', pgs: ['methyl-ether'] },
	{ name: 'OG-5230-02 chloro iodo pyridine', smiles: 'Clc1ncc(I)cc1' },
	{ name: 'OG-5230-03 dichloropyrimidine', smiles: 'Clc1ccnc(Cl)n1' },
	{ name: 'OG-5230-04 butynediol', smiles: 'OCC#CCO' },
	{
		name: 'OG-5230-05 TMS phenylacetylene (not internal)',
		smiles: 'C[Si](C)(C)C#Cc1ccccc1',
		pgs: ['TMS-alkyne']
	},
	{ name: 'OG-5230-06 conjugated diyne', smiles: 'CCC#CC#CCO' },
	{ name: 'OG-5230-07 ethyl aminobenzoate', smiles: 'Nc1ccc(cc1)C(=O)OCC', pgs: ['ethyl-ester'] },
	{ name: 'OG-5230-08 N-methyl acetanilide (no N–H)', smiles: 'CN(C(C)=O)c1ccccc1' },
	{ name: 'OG-5230-09 diphenylamine', smiles: 'c1ccc(Nc2ccccc2)cc1' },
	{ name: 'OG-5230-10 aminobromopyridine', smiles: 'Nc1ccc(Br)cn1' },
	{ name: 'OG-5230-11 phenylurea (no aniline)', smiles: 'NC(=O)Nc1ccccc1' },
	{ name: 'OG-5230-12 N-methyl aniline', smiles: 'CNc1ccc(C)cc1' },
	{
		name: 'OG-5230-13 methyl pyrazole carboxylate',
		smiles: 'COC(=O)c1cc[nH]n1',
		pgs: ['methyl-ester']
	},
	{ name: 'OG-5230-14 phenyl imidazole', smiles: 'c1ccc(-c2ncc[nH]2)cc1' },
	{ name: 'OG-5230-15 phenyl tetrazole', smiles: 'c1ccc(-c2nn[nH]n2)cc1' },
	{ name: 'OG-5230-16 azaindole', smiles: 'c1cnc2[nH]ccc2c1' },
	{ name: 'OG-5230-17 benzimidazole methanol', smiles: 'OCc1nc2ccccc2[nH]1' },
	{ name: 'OG-5230-18 carbazole (indole N–H)', smiles: 'c1ccc2c(c1)[nH]c1ccccc12' },
	{ name: 'OG-5230-19 phenyl pyrrole', smiles: 'c1ccc(-c2ccc[nH]2)cc1' },
	{ name: 'OG-5230-20 methylpyridine N-oxide (no azine N)', smiles: '[O-][n+]1ccccc1C' },
	{ name: 'OG-5230-21 pyridyl boronic acid', smiles: 'OB(O)c1cccnc1' },
	{
		name: 'OG-5230-22 Bpin methyl benzoate',
		smiles: 'CC1(C)OB(c2ccc(cc2)C(=O)OC)OC1(C)C',
		pgs: ['methyl-ester']
	},
	{
		name: 'OG-5230-23 aryl triflate ester',
		smiles: 'COC(=O)c1ccc(OS(=O)(=O)C(F)(F)F)cc1',
		pgs: ['methyl-ester']
	},
	{ name: 'OG-5230-24 phenethyl mesylate', smiles: 'CS(=O)(=O)OCCc1ccccc1' },
	{ name: 'OG-5230-25 cyclohexenyl triflate', smiles: 'O=S(=O)(OC1=CCCCC1)C(F)(F)F' },
	{ name: 'OG-5230-26 methyl sulfate (no sulfonate)', smiles: 'COS(=O)(=O)OC' },
	{ name: 'OG-5230-27 acryloyl pyrrolidine', smiles: 'C=CC(=O)N1CCCC1' },
	{ name: 'OG-5230-28 enaminone (not an acceptor)', smiles: 'CN(C)/C=C/C(=O)c1ccccc1' },
	{ name: 'OG-5230-29 butyl vinyl ether', smiles: 'C=COCCCC' },
	{ name: 'OG-5230-30 enamine', smiles: 'CC=C(C)N1CCCC1' },
	{ name: 'OG-5230-31 nitrostyrene', smiles: '[O-][N+](=O)/C=C/c1ccccc1' },
	{ name: 'OG-5230-32 phenyl vinyl sulfone', smiles: 'C=CS(=O)(=O)c1ccccc1' },
	{
		name: 'OG-5230-33 dimethyl fumarate',
		smiles: 'COC(=O)/C=C/C(=O)OC',
		pgs: ['methyl-ester', 'methyl-ester']
	},
	{ name: 'OG-5230-34 cinnamonitrile', smiles: 'N#C/C=C/c1ccccc1' },
	{ name: 'OG-5230-35 iodo allyl alcohol', smiles: 'OC/C=C/I' },
	{ name: 'OG-5230-36 bromostyrene', smiles: 'Br/C=C/c1ccccc1' },
	{ name: 'OG-5230-37 benzhydrol', smiles: 'OC(c1ccccc1)c1ccccc1' },
	{ name: 'OG-5230-38 cinnamyl alcohol', smiles: 'OC/C=C/c1ccccc1' },
	{ name: 'OG-5230-39 homoallylic alcohol (not allylic)', smiles: 'OCCC=C' },
	{ name: 'OG-5230-40 acetone cyanohydrin', smiles: 'CC(C)(O)C#N' },
	{ name: 'OG-5230-41 hydroxyacetone', smiles: 'CC(=O)CO' },
	{ name: 'OG-5230-42 piperonyl alcohol (methylenedioxy)', smiles: 'OCc1ccc2OCOc2c1' },
	{
		name: 'OG-5230-43 phenyl glucoside',
		smiles: 'OC[C@H]1O[C@@H](Oc2ccccc2)[C@H](O)[C@@H](O)[C@@H]1O'
	},
	{
		name: 'OG-5230-44 MIDA bromophenyl boronate',
		smiles: 'C[N+]12CC(=O)O[B-]1(c1ccc(Br)cc1)OC(=O)C2',
		pgs: ['MIDA-boronate']
	},
	{
		name: 'OG-5230-45 MIDA boronate drawn as an eight-membered ring',
		smiles: 'CN1CC(=O)OB(c2ccc(Br)cc2)OC(=O)C1',
		pgs: ['MIDA-boronate']
	},
	{ name: 'OG-5230-46 tolyl B(dan)', smiles: 'Cc1ccc(cc1)B1Nc2cccc3cccc(N1)c23', pgs: ['Bdan'] }
];
