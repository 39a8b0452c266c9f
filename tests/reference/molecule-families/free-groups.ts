import type { ReferenceMolecule } from '../molecules';

// Part of the reference molecule set (see ../molecules.ts): Free groups of every kind.
export const freeGroups: ReferenceMolecule[] = [
	// Free groups of every kind
	{ name: 'OG-4410-01 glycidyl methyl ether', smiles: 'C[C@@H]1O[C@H]1CO' },
	{
		name: 'OG-4410-02 methoxyphenylacetonitrile',
		smiles: 'N#CCc1ccc(OC)cc1',
		pgs: ['methyl-ether']
	},
	{ name: 'OG-4410-03 azidopropanol', smiles: 'OCCCN=[N+]=[N-]' },
	{ name: 'OG-4410-04 nitrobenzyl alcohol', smiles: 'OCc1ccc(cc1)[N+](=O)[O-]' },
	{ name: 'OG-4410-05 benzyl imine', smiles: 'CC(C)=NCc1ccccc1' },
	{ name: 'OG-4410-06 thioether amino acid', smiles: 'CSCC[C@H](N)C(=O)O' },
	{ name: 'OG-4410-07 bromobutanol', smiles: 'OCCCCBr' },
	{ name: 'OG-4410-08 chloroaryl morpholide', smiles: 'Clc1ccc(cc1)C(=O)N1CCOCC1' },
	{ name: 'OG-4410-09 furfuryl alcohol', smiles: 'OCc1ccco1' },
	{ name: 'OG-4410-10 skatole', smiles: 'Cc1c[nH]c2ccccc12' },
	{ name: 'OG-4410-11 open-chain aldohexose', smiles: 'OC[C@@H](O)[C@@H](O)[C@H](O)[C@@H](O)C=O' },
	{ name: 'OG-4410-12 pentane-2,4-diol', smiles: 'CC(O)CC(O)C' },
	{ name: 'OG-4410-13 hydroxyphenylacetic acid', smiles: 'Oc1ccc(CC(=O)O)cc1' },
	{ name: 'OG-4410-14 hexenoic acid', smiles: 'OC(=O)CCCC=C' },
	{ name: 'OG-4410-15 acetanilide phenol', smiles: 'CC(=O)Nc1ccc(O)cc1' },
	{ name: 'OG-4410-16 N-methyl lactam', smiles: 'O=C1CCCN1C' },
	{ name: 'OG-4410-17 benzylacetone', smiles: 'CC(=O)CCc1ccccc1' },
	{ name: 'OG-4410-18 anisaldehyde ortho', smiles: 'O=Cc1ccccc1OC', pgs: ['methyl-ether'] },
	{ name: 'OG-4410-19 phenyl tertiary alcohol', smiles: 'CC(C)(O)c1ccccc1' },
	{ name: 'OG-4410-20 N-methyl phenethylamine', smiles: 'CNCCc1ccccc1' },
	{ name: 'OG-4410-21 dimethylamino aryl ether', smiles: 'CN(C)CCCOc1ccc(F)cc1' },
	{ name: 'OG-4410-22 propargyl alcohol', smiles: 'C#CCO' },
	{
		name: 'OG-4410-23 steroid enone',
		smiles: 'C[C@]12CC[C@H]3[C@@H](CCC4=CC(=O)CC[C@@]34C)[C@@H]1CC[C@@H]2O'
	},
	{ name: 'OG-4410-24 pyridylmethanol', smiles: 'OCc1ccncc1' },
	{ name: 'OG-4410-25 acetylthiophene', smiles: 'CC(=O)c1cccs1' },
	{ name: 'OG-4410-26 pyrrole aldehyde', smiles: 'O=Cc1ccc[nH]1' },
	{ name: 'OG-4410-27 methylimidazole methanol', smiles: 'Cn1ccnc1CO' },
	{ name: 'OG-4410-28 styryl ketone', smiles: 'CC(=O)/C=C/c1ccccc1' },
	{ name: 'OG-4410-29 ethyl acrylate', smiles: 'C=CC(=O)OCC', pgs: ['ethyl-ester'] },
	{ name: 'OG-4410-30 hydroxy macrolactone', smiles: 'O=C1C[C@H](O)CC/C=C/C[C@@H](C)O1' },
	{ name: 'OG-4410-31 ethanolamine', smiles: 'NCCO' },
	{ name: 'OG-4410-32 benzoyl piperazine', smiles: 'O=C(c1ccccc1)N1CCNCC1' },
	{ name: 'OG-4410-33 dienoic acid', smiles: 'C/C=C/C=C/C(=O)O' },
	{ name: 'OG-4410-34 quinolinylmethanol', smiles: 'OCc1cccc2ncccc12' },
	{ name: 'OG-4410-35 trifluoromethyl benzylamine', smiles: 'FC(F)(F)c1ccc(CN)cc1' },
	{ name: 'OG-4410-36 chloroacetate', smiles: 'ClCC(=O)OCC', pgs: ['ethyl-ester'] },
	{ name: 'OG-4410-37 benzofuranyl ketone', smiles: 'CC(=O)c1cc2ccccc2o1' },
	{ name: 'OG-4410-38 methyl glucoside', smiles: 'CO[C@H]1O[C@H](CO)[C@@H](O)[C@H](O)[C@H]1O' },
	{ name: 'OG-4410-39 cyclohexene diol', smiles: 'O[C@@H]1CC=CC[C@H]1O' },
	{ name: 'OG-4410-40 cyano ester', smiles: 'N#CCC(=O)OC(C)(C)C', pgs: ['tBu-ester'] },
	{ name: 'OG-4410-41 Boc N-methyl ethanolamine', smiles: 'CN(C(=O)OC(C)(C)C)CCO', pgs: ['Boc'] },
	{ name: 'OG-4410-42 thiolane methanol', smiles: 'C1CCSC1CO' },
	{ name: 'OG-4410-43 iodoaryl amine', smiles: 'Nc1ccc(I)cc1CC(=O)OC', pgs: ['methyl-ester'] }
];
