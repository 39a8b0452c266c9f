// A 30-intermediate route of the invented scenario: two fragments of the fictional candidate
// OG-2031, each carried through several protect / transform / deprotect steps. The structures are
// ordinary drug-like intermediates written for Orthogon; no real programme is depicted.

export const routeOG2031: { key: string; smiles: string }[] = [
	// Fragment A: aryl ether and aminopyridine arm
	{ key: 'A01', smiles: 'COC(=O)c1ccc(O)cc1' },
	{ key: 'A02', smiles: 'COC(=O)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A03', smiles: 'OCc1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A04', smiles: 'O=Cc1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A05', smiles: 'OC(C#C[Si](C)(C)C)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A06', smiles: 'COCOC(C#C[Si](C)(C)C)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A07', smiles: 'COCOC(C#C)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A08', smiles: 'COCOC(C#Cc1ccc(NC(=O)OC(C)(C)C)nc1)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A09', smiles: 'COCOC(CCc1ccc(NC(=O)OC(C)(C)C)nc1)c1ccc(O[Si](C)(C)C(C)(C)C)cc1' },
	{ key: 'A10', smiles: 'COCOC(CCc1ccc(NC(=O)OC(C)(C)C)nc1)c1ccc(O)cc1' },
	{ key: 'A11', smiles: 'CCOC(=O)COc1ccc(C(CCc2ccc(NC(=O)OC(C)(C)C)nc2)OCOC)cc1' },
	{ key: 'A12', smiles: 'OC(=O)COc1ccc(C(CCc2ccc(NC(=O)OC(C)(C)C)nc2)OCOC)cc1' },
	{
		key: 'A13',
		smiles: 'O=C(COc1ccc(C(CCc2ccc(NC(=O)OC(C)(C)C)nc2)OCOC)cc1)N1CCN(C(=O)OCc2ccccc2)CC1'
	},
	{ key: 'A14', smiles: 'O=C(COc1ccc(C(CCc2ccc(NC(=O)OC(C)(C)C)nc2)OCOC)cc1)N1CCNCC1' },
	{
		key: 'A15',
		smiles: 'O=C(COc1ccc(C(CCc2ccc(NC(=O)OC(C)(C)C)nc2)OCOC)cc1)N1CCN(C[C@H]2COC(C)(C)O2)CC1'
	},
	{ key: 'A16', smiles: 'O=C(COc1ccc(C(O)CCc2ccc(N)nc2)cc1)N1CCN(C[C@H](O)CO)CC1' },
	// Fragment B: polyol side chain with a masked ketone and amine
	{ key: 'B01', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H]1CO1' },
	{ key: 'B02', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](O)CC=C' },
	{ key: 'B03', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC=C)OCc1ccc(OC)cc1' },
	{ key: 'B04', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC=O)OCc1ccc(OC)cc1' },
	{ key: 'B05', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1SCCCS1)OCc1ccc(OC)cc1' },
	{ key: 'B06', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1(CCCOC2CCCCO2)SCCCS1)OCc1ccc(OC)cc1' },
	{ key: 'B07', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC(=O)CCCOC1CCCCO1)OCc1ccc(OC)cc1' },
	{ key: 'B08', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1(CCCOC2CCCCO2)OCCO1)OCc1ccc(OC)cc1' },
	{ key: 'B09', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1(CCCO)OCCO1)OCc1ccc(OC)cc1' },
	{ key: 'B10', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1(CCCN=[N+]=[N-])OCCO1)OCc1ccc(OC)cc1' },
	{
		key: 'B11',
		smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](CC1(CCCNC(=O)OCC2c3ccccc3-c3ccccc32)OCCO1)OCc1ccc(OC)cc1'
	},
	{ key: 'B12', smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](O)CC1(CCCNC(=O)OCC2c3ccccc3-c3ccccc32)OCCO1' },
	{
		key: 'B13',
		smiles: 'CC(C)(C)[Si](C)(C)OC[C@@H](OC(=O)c1ccccc1)CC1(CCCNC(=O)OCC2c3ccccc3-c3ccccc32)OCCO1'
	},
	{ key: 'B14', smiles: 'OC[C@@H](OC(=O)c1ccccc1)CC1(CCCNC(=O)OCC2c3ccccc3-c3ccccc32)OCCO1' }
];
