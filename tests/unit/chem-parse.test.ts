// Reading structures: format detection, molfile/SDF round trips, and every class of bad input.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Molecule } from 'openchemlib';
import { detectFormat, MAX_STRUCTURE_BYTES } from '../../src/lib/chem/format';
import { readStructure, readStructures } from '../../src/lib/chem/parse';
import { StructureError } from '../../src/lib/chem/errors';
import { canonicalForm, formulaOf } from '../../src/lib/chem/properties';
import { smilesAtoms } from '../../src/lib/chem/smiles-atoms';

const fixture = (name: string) =>
	readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');
const keyOf = (text: string) =>
	canonicalForm(readStructure(text, { coordinates: true }).molecule).key;

/** The StructureError a read throws (fails the test when nothing is thrown). */
function failure(text: string): StructureError {
	try {
		readStructure(text);
	} catch (caught) {
		if (caught instanceof StructureError) {
			return caught;
		}
		throw caught;
	}
	throw new Error(`expected ${JSON.stringify(text.slice(0, 40))} to be refused`);
}

// OG-2044-19: a Boc amino alcohol with a TBS ether and one stereocentre.
const SMILES = 'CC(C)(C)OC(=O)NCC[C@H](C)O[Si](C)(C)C(C)(C)C';

describe('format detection', () => {
	it('tells SMILES, V2000, V3000 and SDF apart from the text', () => {
		const molecule = Molecule.fromSmiles(SMILES);
		expect(detectFormat(SMILES)).toBe('smiles');
		expect(detectFormat(`${SMILES} OG-2044-19`)).toBe('smiles');
		expect(detectFormat(molecule.toMolfile())).toBe('molfile-v2000');
		expect(detectFormat(molecule.toMolfileV3())).toBe('molfile-v3000');
		expect(detectFormat(`${molecule.toMolfile()}\n> <ID>\nOG-2044-19\n\n$$$$\n`)).toBe('sdf');
	});
});

describe('round trips', () => {
	it('a SMILES written out as molfile V2000 reads back as the same molecule, stereo included', () => {
		const v2000 = Molecule.fromSmiles(SMILES).toMolfile();
		expect(readStructure(v2000).format).toBe('molfile-v2000');
		expect(keyOf(v2000)).toBe(keyOf(SMILES));
	});
	it('and as molfile V3000', () => {
		const v3000 = Molecule.fromSmiles(SMILES).toMolfileV3();
		expect(readStructure(v3000).format).toBe('molfile-v3000');
		expect(keyOf(v3000)).toBe(keyOf(SMILES));
	});
	it('the enantiomer gets a different key (stereo is part of the key)', () => {
		expect(keyOf(SMILES.replace('[C@H]', '[C@@H]'))).not.toBe(keyOf(SMILES));
	});
	it('an SDF with several records keeps every record and its data fields', () => {
		const records = ['OCCO', 'CC(=O)OCC', SMILES].map((smiles, i) => {
			const molfile = Molecule.fromSmiles(smiles).toMolfile();
			return `${molfile}\n> <ID>\nOG-2031-${10 + i}\n\n> <NOTE>\nline one\nline two\n\n$$$$\n`;
		});
		const sdf = records.join('');
		const read = readStructures(sdf);
		expect(read.map((r) => formulaOf(r.molecule))).toEqual(['C2H6O2', 'C4H8O2', 'C15H33NO3Si']); // counted by hand from the SMILES
		expect(read.map((r) => r.fields.ID)).toEqual(['OG-2031-10', 'OG-2031-11', 'OG-2031-12']);
		expect(read[0]!.fields.NOTE).toBe('line one\nline two');
		expect(keyOf(sdf)).toBe(keyOf('OCCO')); // readStructure takes the first record
		// And the SDF record written back out reads as the same molecule.
		expect(canonicalForm(Molecule.fromMolfile(read[2]!.molecule.toMolfile())).key).toBe(
			keyOf(SMILES)
		);
	});
	it('reads hand-written V2000 and V3000 files (not made by openchemlib)', () => {
		// Acetic acid C2H4O2 and ethanol C2H6O (formulas: common practice).
		expect(formulaOf(readStructure(fixture('acetic-acid-v2000.mol')).molecule)).toBe('C2H4O2');
		expect(formulaOf(readStructure(fixture('ethanol-v3000.mol')).molecule)).toBe('C2H6O');
		expect(keyOf(fixture('ethanol-v3000.mol'))).toBe(keyOf('OCC'));
	});
});

describe('bad input', () => {
	it('empty or blank text', () => {
		expect(failure('').code).toBe('empty');
		expect(failure('   \n\t ').code).toBe('empty');
	});
	it('more than 1 MB of structure text', () => {
		const error = failure('C'.repeat(MAX_STRUCTURE_BYTES + 1));
		expect(error.code).toBe('too_large');
		expect(error.message).toMatch(/1 MB/);
		// Multi-byte characters count as bytes, not as characters.
		expect(failure('é'.repeat(MAX_STRUCTURE_BYTES / 2 + 1)).code).toBe('too_large');
	});
	it('text that is no structure at all, with the position for SMILES', () => {
		const error = failure('hello');
		expect(error.code).toBe('smiles_syntax');
		expect(error.position).toBe(0);
		expect(failure('this is\nnot a molecule').code).toBe('unknown_format');
	});
	it('an unclosed ring says so and where', () => {
		const error = failure('C1CCCC');
		expect(error.code).toBe('unclosed_ring');
		expect(error.message).toMatch(/never closed/);
		expect(error.position).toBe(6);
	});
	it('an unbalanced parenthesis and an unknown element point at their character', () => {
		expect(failure('CC)C')).toMatchObject({ code: 'smiles_syntax', position: 2 });
		expect(failure('C[Xq]C')).toMatchObject({ code: 'unknown_element', position: 1 });
		expect(failure('  CC)C').position).toBe(4); // leading blanks are counted
	});
	it('a pentavalent carbon names the atom and its position', () => {
		const error = failure('CC(C)(C)(C)(C)O');
		expect(error.code).toBe('bad_valence');
		expect(error.atom).toBe(1);
		expect(error.position).toBe(1);
		expect(error.message).toMatch(/atom 2 \(C, at character 2\)/);
		expect(failure('CO(C)C').code).toBe('bad_valence'); // trivalent neutral oxygen
	});
	it('an aromatic ring that cannot be kekulized', () => {
		expect(failure('c1cccc1').code).toBe('invalid_structure');
	});
	it('bad valence in a molfile names the atom', () => {
		// A carbon with five carbon neighbours, written by hand.
		const atom = (x: number, y: number) =>
			`${x.toFixed(4).padStart(10)}${y.toFixed(4).padStart(10)}    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0`;
		const bond = (a: number, b: number) => `${String(a).padStart(3)}${String(b).padStart(3)}  1  0`;
		const molfile = [
			'OG-9999 impossible carbon',
			'  Orthogon',
			'',
			'  6  5  0  0  0  0  0  0  0  0999 V2000',
			atom(0, 0),
			atom(1, 0),
			atom(-1, 0),
			atom(0, 1),
			atom(0, -1),
			atom(0.7, 0.7),
			bond(1, 2),
			bond(1, 3),
			bond(1, 4),
			bond(1, 5),
			bond(1, 6),
			'M  END'
		].join('\n');
		expect(failure(molfile)).toMatchObject({ code: 'bad_valence', atom: 0 });
		expect(failure(molfile).message).toMatch(/atom 1 \(C\)/);
	});
	it('a truncated molfile and a molfile without counts line', () => {
		const molfile = Molecule.fromSmiles('OCCO').toMolfile();
		const truncated = molfile.split('\n').slice(0, 6).join('\n') + '\nM  END\n';
		expect(failure(truncated).code).toBe('molfile_syntax');
		expect(failure('title\n\n\nnot a counts line\nM  END\n').code).toBe('molfile_syntax');
	});
	it('an SDF record without M  END names the record', () => {
		const good = `${Molecule.fromSmiles('CCO').toMolfile()}\n$$$$\n`;
		let caught: unknown;
		try {
			readStructures(`${good}broken\n\n\n  1  0  0  0  0  0  0  0  0  0999 V2000\n$$$$\n`);
		} catch (error) {
			caught = error;
		}
		expect(caught).toMatchObject({ code: 'sdf_syntax', record: 2 });
	});
	it('stereo complaints and an unbalanced charge are warnings, not refusals', () => {
		// A quaternary ammonium drawn without its counter-ion (common practice to accept).
		const salt = readStructure('C[N+](C)(C)CCO');
		expect(formulaOf(salt.molecule)).toBe('C5H14NO+'); // choline cation (common practice)
		expect(salt.warnings.length).toBeGreaterThan(0);
	});
});

describe('SMILES atom positions', () => {
	it('follows brackets, two-letter elements and ring closures', () => {
		expect(smilesAtoms('Cl[C@@H]1CC%12N1Br').map((a) => [a.symbol, a.position])).toEqual([
			['Cl', 0],
			['C', 2],
			['C', 9],
			['C', 10],
			['N', 14],
			['Br', 16]
		]);
	});
});
