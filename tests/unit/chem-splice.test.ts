import { Molecule } from 'openchemlib';
import { describe, expect, it } from 'vitest';
import { readStructure } from '../../src/lib/chem/parse';
import { spliceTransforms, SpliceUnsupported } from '../../src/lib/chem/smiles-splice';
import { writtenGraph } from '../../src/lib/chem/smiles-graph';
import { drawnByReactor, protectedStructure } from '../../src/lib/rules/plan/draw';
import { freeUnits } from '../../src/lib/rules/plan/track';
import rows from '../../rules/protecting-groups.json';
import { MODEL_SUBSTRATES as MODELS } from '../factories/model-substrates';

// The SMILES splicer (chem/smiles-splice.ts) must make the molecule openchemlib's Reactor made
// before it, stereo included: both are compared through openchemlib's ID code, which is canonical
// and encodes tetrahedral and double-bond stereo. Substrates are invented OG-2031 molecules.

const idCode = (smiles: string) => Molecule.fromSmiles(smiles).getIDCode();
const transformOf = (pg: string, group: string) =>
	rows.find((r) => r.id === pg)!.install.transforms.find((t) => t.groups.includes(group))!.smarts;
const unitsOf = (smiles: string, group: string) => freeUnits(smiles).filter((u) => u.id === group);
const splice = (smiles: string, masks: { smarts: string; atoms: number[] }[]) =>
	spliceTransforms(smiles, readStructure(smiles).molecule, masks);

describe('editing a SMILES in place draws what the Reactor drew', () => {
	for (const row of rows) {
		for (const transform of row.install.transforms) {
			for (const group of transform.groups) {
				it(`${row.id} on a ${group}`, () => {
					const model = MODELS[group]!;
					const masks = [{ smarts: transform.smarts, atoms: unitsOf(model, group)[0]!.atoms }];
					expect(
						idCode(
							protectedStructure(
								model,
								masks.map((m) => ({ pg: row.id, transform: m.smarts, atoms: m.atoms }))
							)
						)
					).toBe(idCode(drawnByReactor(model, masks)));
				});
			}
		}
	}

	// Stereo next to the site, several sites at once, every way a removed oxygen can be written.
	const cases: [string, string, [string, string, number?][]][] = [
		[
			'secondary alcohol beside a stereocentre and an E alkene',
			'C/C=C/[C@H](O)[C@@H](C)CC=O',
			[
				['TBS', 'alcohol-secondary'],
				['dioxolane', 'aldehyde']
			]
		],
		[
			'ketone written first, in a ring, beside a stereocentre',
			'O=C1CC[C@@H](O)[C@H](C)C1',
			[
				['dioxolane', 'ketone'],
				['Bn', 'alcohol-secondary']
			]
		],
		[
			'aldehyde at the end of a branch',
			'CC(CC=O)[C@](C)(O)CC',
			[
				['dimethyl-acetal', 'aldehyde'],
				['TMS', 'alcohol-tertiary']
			]
		],
		[
			'diol on a ring that already uses ring numbers 1 and 2',
			'C1CC2CC[C@@H](O)[C@H](O)C2C1',
			[['acetonide', 'diol-1,2']]
		],
		[
			'two primary alcohols masked together',
			'OCC[C@H](N)CCO',
			[
				['TBS', 'alcohol-primary', 0],
				['TBS', 'alcohol-primary', 1],
				['Boc', 'amine-primary']
			]
		],
		[
			'bracketed hydroxyl and an isotope label',
			'[18OH]C[C@@H](C)C(=O)[OH]',
			[
				['Ac', 'alcohol-primary'],
				['methyl-ester', 'carboxylic-acid']
			]
		],
		['indole N–H beside a Z alkene', 'C/C=C\\c1c[nH]c2ccccc12', [['Boc', 'indole-nh']]],
		[
			'terminal alkyne and thiol',
			'C#C[C@@H](S)CC',
			[
				['TMS-alkyne', 'alkyne-terminal'],
				['S-Tr', 'thiol']
			]
		],
		['boronic acid written in the middle', 'Cc1ccc(B(O)O)cc1', [['Bdan', 'boronic-acid']]]
	];
	for (const [what, smiles, picks] of cases) {
		it(`agrees on a ${what}`, () => {
			const masks = picks.map(([pg, group, nth]) => ({
				smarts: transformOf(pg, group),
				atoms: unitsOf(smiles, group)[nth ?? 0]!.atoms
			}));
			const spliced = splice(smiles, masks);
			expect(idCode(spliced), spliced).toBe(idCode(drawnByReactor(smiles, masks)));
			// The untouched text keeps the chemist's stereo marks as written.
			for (const mark of smiles.match(/\[[^\]]*@[^\]]*\]|[/\\]/g) ?? []) {
				expect(spliced).toContain(mark);
			}
		});
	}
});

describe('what the splicer keeps that the Reactor lost', () => {
	it('keeps a counter-ion written beside the substrate (the Reactor returned the reacting component only)', () => {
		const smiles = 'OCCC(=O)C.Cl';
		const masks = [
			{
				smarts: transformOf('THP', 'alcohol-primary'),
				atoms: unitsOf(smiles, 'alcohol-primary')[0]!.atoms
			},
			{ smarts: transformOf('dioxane', 'ketone'), atoms: unitsOf(smiles, 'ketone')[0]!.atoms }
		];
		const spliced = splice(smiles, masks);
		expect(spliced).toMatch(/\.Cl$/);
		expect(drawnByReactor(smiles, masks)).not.toContain('.');
		expect(idCode(spliced.replace(/\.Cl$/, ''))).toBe(idCode(drawnByReactor(smiles, masks)));
	});
});

describe('what the splicer leaves to the Reactor', () => {
	it('refuses to charge a mapped atom (MIDA boronate), and the drawing still comes from the Reactor', () => {
		const smiles = MODELS['boronic-acid']!;
		const mida = {
			smarts: transformOf('MIDA-boronate', 'boronic-acid'),
			atoms: unitsOf(smiles, 'boronic-acid')[0]!.atoms
		};
		expect(() => splice(smiles, [mida])).toThrow(SpliceUnsupported);
		expect(
			protectedStructure(smiles, [
				{ pg: 'MIDA-boronate', transform: mida.smarts, atoms: mida.atoms }
			])
		).toBe(drawnByReactor(smiles, [mida]));
	});

	it('refuses a new bond on a stereocentre written in the SMILES', () => {
		// An invented transform methylating a stereocentre's carbon: its parity would change meaning.
		expect(() => splice('C[C@H](O)CC', [{ smarts: '[C;H1:1]>>[C:1]C', atoms: [1] }])).toThrow(
			SpliceUnsupported
		);
	});

	it('draws a molfile through the Reactor', () => {
		const molfile = Molecule.fromSmiles('CC(=O)CCO').toMolfile();
		const masks = [
			{
				smarts: transformOf('TBS', 'alcohol-primary'),
				atoms: unitsOf(molfile, 'alcohol-primary')[0]!.atoms
			}
		];
		expect(
			protectedStructure(
				molfile,
				masks.map((m) => ({ pg: 'TBS', transform: m.smarts, atoms: m.atoms }))
			)
		).toBe(drawnByReactor(molfile, masks));
	});
});

describe('reading a SMILES as written', () => {
	it('numbers atoms as openchemlib does and keeps ring bonds and symbols', () => {
		const graph = writtenGraph('O=C1CC[C@@H](O)C=1.[Na+]');
		expect(graph.atoms.map((a) => a.text)).toEqual([
			'O',
			'C',
			'C',
			'C',
			'[C@@H]',
			'O',
			'C',
			'[Na+]'
		]);
		expect(graph.bonds).toContainEqual({ from: 1, to: 6, symbol: '=' });
		expect([...graph.ringNumbers]).toEqual([1]);
		expect(graph.atoms.length).toBe(Molecule.fromSmiles('O=C1CC[C@@H](O)C=1.[Na+]').getAllAtoms());
	});
});
