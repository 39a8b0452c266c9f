// Structures on which a toolkit's aromaticity model and the chemistry part ways. The chemistry
// (what a bench chemist planning protecting groups would call the group) is what Orthogon reports.
// RDKit's figures are checked live in groups-vs-rdkit.test.ts; openchemlib's raw figures (the
// reference SMARTS run as-is) are checked in chem-perceive.test.ts.

export type AromaticityCase = {
	name: string;
	smiles: string;
	/** Instances RDKit finds with the reference SMARTS. */
	rdkit: Record<string, number>;
	/** Instances a chemist names, and Orthogon reports. */
	chemistry: Record<string, number>;
	why: string;
};

export const aromaticityDisagreements: AromaticityCase[] = [
	{
		name: 'OG-5120-01 hydroxymethyl coumarin',
		smiles: 'OCc1ccc2C=CC(=O)Oc2c1',
		rdkit: { ester: 0, alkene: 0, 'michael-acceptor': 0, 'alcohol-primary': 1 },
		chemistry: { ester: 1, alkene: 1, 'michael-acceptor': 1, 'alcohol-primary': 1 },
		why: 'RDKit counts the 2-pyranone ring of a coumarin as aromatic, so its C=O is no ester and C3=C4 no alkene or Michael acceptor. Chemically it is an α,β-unsaturated lactone: hydroxide opens it and C3=C4 takes hydrogen and nucleophiles (common practice).'
	},
	{
		name: 'OG-5120-02 methyl chromone',
		smiles: 'CC1=CC(=O)c2ccccc2O1',
		rdkit: { ketone: 0, alkene: 0, 'michael-acceptor': 0 },
		chemistry: { ketone: 1, alkene: 1, 'michael-acceptor': 1 },
		why: 'RDKit counts the 4-pyranone ring as aromatic. A chromone reacts as a vinylogous ester / enone: its C4=O takes hydride and organometallics and C2=C3 adds nucleophiles (common practice).'
	},
	{
		name: 'OG-5120-03 furfuryl ester',
		smiles: 'CC(=O)OCc1ccco1',
		rdkit: { alkene: 0, ester: 1 },
		chemistry: { alkene: 0, ester: 1 },
		why: 'RDKit and the chemistry agree (furan is aromatic); openchemlib keeps the furan ring bonds as double bonds, so the bare reference SMARTS finds two "alkenes" there. The pattern column adds ;A.'
	},
	{
		name: 'OG-5120-04 indole-3-propanol',
		smiles: 'OCCCc1c[nH]c2ccccc12',
		rdkit: { alkene: 0, 'indole-nh': 1 },
		chemistry: { alkene: 0, 'indole-nh': 1 },
		why: 'As for furan: the C2=C3 bond of indole is aromatic, not an alkene, though openchemlib stores it as a double bond.'
	},
	{
		name: 'OG-5120-05 thienyl imidazole sulfide',
		smiles: 'CSc1nccn1Cc1cccs1',
		rdkit: { alkene: 0, imine: 0, sulfide: 1 },
		chemistry: { alkene: 0, imine: 0, sulfide: 1 },
		why: 'Imidazole C=N is not an imine and thiophene S is not a sulfide; the SMe on the imidazole carbon is.'
	}
];
