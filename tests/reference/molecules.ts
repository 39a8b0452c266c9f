// The reference molecule set: intermediates of Orthogon's invented scenario (OG-2031, OG-2044,
// OG-3107 and friends). Names are fictional; the structures are ordinary, chemically sensible
// drug-like, natural-product-like and protecting-group-bearing molecules written for these tests.
// `pgs` lists the protecting groups a chemist would name on the structure (common practice); the
// functional-group counts are not written here at all: they come from RDKit at test time.

export type ReferenceMolecule = { name: string; smiles: string; pgs?: string[] };

export const referenceMolecules: ReferenceMolecule[] = [
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
	},
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
	{ name: 'OG-3107-17 free thiol amino acid', smiles: 'SCC[C@H](N)C(=O)O' },
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
	{ name: 'OG-5120-12 methyl ether alkenol', smiles: 'CO[C@@H](CC=C)CCO', pgs: ['methyl-ether'] },
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
	{ name: 'OG-4410-43 iodoaryl amine', smiles: 'Nc1ccc(I)cc1CC(=O)OC', pgs: ['methyl-ester'] },
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
	{ name: 'OG-5230-46 tolyl B(dan)', smiles: 'Cc1ccc(cc1)B1Nc2cccc3cccc(N1)c23', pgs: ['Bdan'] },
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
