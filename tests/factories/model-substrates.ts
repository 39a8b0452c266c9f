/**
 * One small invented substrate per free-group type a protecting group can mask, each with exactly
 * one such group (stereocentres where a PG could disturb them), for the transform and drawing tests.
 */
export const MODEL_SUBSTRATES: Record<string, string> = {
	'alcohol-primary': 'OCCCC',
	'alcohol-secondary': 'C[C@@H](O)CC',
	'alcohol-tertiary': 'CC(C)(O)CC',
	phenol: 'Oc1ccc(C)cc1',
	'diol-1,2': 'OC[C@H](O)CCC',
	'diol-1,3': 'OCC[C@@H](O)CC',
	ketone: 'CC(=O)CCC',
	aldehyde: 'O=CCCCC',
	'amine-primary': 'NCCCC',
	'amine-secondary': 'CNCCC',
	'indole-nh': 'c1ccc2[nH]ccc2c1',
	'azole-nh': 'Cc1cc(C)[nH]n1',
	'carboxylic-acid': 'OC(=O)[C@@H](C)CC',
	'alkyne-terminal': 'C#CCCC',
	thiol: 'SCCCC',
	'boronic-acid': 'OB(O)c1ccc(C)cc1',
	aniline: 'Nc1ccc(C)cc1'
};
