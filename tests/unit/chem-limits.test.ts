// Size limits and impossible atoms are refused from the text, before openchemlib parses: the
// values come from STRUCTURE_LIMITS, so the test follows the documented limits.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Molecule } from 'openchemlib';
import { readStructure, readStructures } from '../../src/lib/chem/parse';
import { StructureError } from '../../src/lib/chem/errors';
import { STRUCTURE_LIMITS } from '../../src/lib/chem/limits';

const fixture = (name: string) =>
	readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');

function failure(text: string): StructureError {
	try {
		readStructures(text);
	} catch (caught) {
		if (caught instanceof StructureError) {
			return caught;
		}
		throw caught;
	}
	throw new Error(`expected ${JSON.stringify(text.slice(0, 40))} to be refused`);
}

/** A V2000 molfile written by hand: `atoms` symbols in a row, bonded in a chain. */
function v2000(symbols: string[], countsAtoms = symbols.length): string {
	const atom = (symbol: string, i: number) =>
		`${(i * 1.5).toFixed(4).padStart(10)}    0.0000    0.0000 ${symbol.padEnd(3)} 0  0  0  0  0  0  0  0  0  0  0  0`;
	const bonds = symbols
		.slice(1)
		.map((_, i) => `${String(i + 1).padStart(3)}${String(i + 2).padStart(3)}  1  0`);
	const counts = `${String(countsAtoms).padStart(3)}${String(bonds.length).padStart(3)}  0  0  0  0  0  0  0  0999 V2000`;
	return [
		'hand-written',
		'  Orthogon',
		'',
		counts,
		...symbols.map(atom),
		...bonds,
		'M  END',
		''
	].join('\n');
}

/** A V3000 molfile with `n` carbons in a chain, declaring `declared` atoms. */
function v3000Chain(n: number, declared = n): string {
	const atoms = Array.from({ length: n }, (_, i) => `M  V30 ${i + 1} C ${i * 1.5} 0 0 0`);
	const bonds = Array.from({ length: n - 1 }, (_, i) => `M  V30 ${i + 1} 1 ${i + 1} ${i + 2}`);
	return [
		'chain',
		'  Orthogon',
		'',
		'  0  0  0     0  0            999 V3000',
		'M  V30 BEGIN CTAB',
		`M  V30 COUNTS ${declared} ${n - 1} 0 0 0`,
		'M  V30 BEGIN ATOM',
		...atoms,
		'M  V30 END ATOM',
		'M  V30 BEGIN BOND',
		...bonds,
		'M  V30 END BOND',
		'M  V30 END CTAB',
		'M  END',
		''
	].join('\n');
}

describe('structure size limits (issue 10, defects 1 and 2)', () => {
	it('a 176-byte V3000 molfile declaring 99,999,999 atoms is refused from its COUNTS line', () => {
		// Before the limits, openchemlib allocated arrays for every declared atom and the process died.
		const killer = fixture('declares-99999999-atoms-v3000.mol');
		expect(killer.length).toBeLessThan(200);
		const error = failure(killer);
		expect(error.code).toBe('too_large');
		expect(error.limit).toEqual({
			name: 'maxAtoms',
			max: STRUCTURE_LIMITS.maxAtoms,
			found: 99_999_999
		});
		expect(error.message).toMatch(/declares 99,999,999 atoms/);
	});
	it('a V3000 atom block longer than the limit is refused even when COUNTS is small', () => {
		const error = failure(v3000Chain(STRUCTURE_LIMITS.maxAtoms + 5, 3));
		expect(error.code).toBe('too_large');
		expect(error.limit?.name).toBe('maxAtoms');
	});
	it('a 10,000-atom SMILES is refused at once, naming the limit', () => {
		const error = failure('C'.repeat(10_000));
		expect(error).toMatchObject({ code: 'too_large', limit: { name: 'maxAtoms', found: 10_000 } });
		expect(error.message).toMatch(/10,000 atoms; Orthogon reads at most 1,000/);
	});
	it('heavy atoms have their own, smaller cap; explicit hydrogens do not count', () => {
		const over = STRUCTURE_LIMITS.maxHeavyAtoms + 1;
		expect(failure('C'.repeat(over)).limit).toMatchObject({ name: 'maxHeavyAtoms', found: over });
		expect(failure(v3000Chain(over)).limit).toMatchObject({ name: 'maxHeavyAtoms', found: over });
		// A chain at the cap is read, and so is one heavy atom with many explicit hydrogens.
		expect(readStructure('C'.repeat(STRUCTURE_LIMITS.maxHeavyAtoms)).molecule.getAllAtoms()).toBe(
			STRUCTURE_LIMITS.maxHeavyAtoms
		);
		expect(readStructure(v2000(['H', 'C', 'H'])).molecule.getAllAtoms()).toBe(3);
	});
	it('the limit names the SDF record', () => {
		const big = Molecule.fromSmiles('C'.repeat(STRUCTURE_LIMITS.maxHeavyAtoms + 1), {
			noCoordinates: true
		}).toMolfileV3();
		const sdf = `${Molecule.fromSmiles('CCO').toMolfile()}$$$$\n${big}$$$$\n`;
		expect(failure(sdf)).toMatchObject({ code: 'too_large', record: 2 });
	});
});

describe('atoms that do not exist (issue 10, defect 11)', () => {
	it('[Qq] in a SMILES is an unknown element, at its character', () => {
		expect(failure('CC[Qq]O')).toMatchObject({ code: 'unknown_element', position: 2 });
	});
	it('Qq in a V2000 atom line and in a V3000 atom line', () => {
		expect(failure(v2000(['C', 'Qq', 'O']))).toMatchObject({ code: 'unknown_element', atom: 1 });
		expect(failure(v3000Chain(3).replace('M  V30 2 C', 'M  V30 2 Qq'))).toMatchObject({
			code: 'unknown_element',
			atom: 1
		});
	});
	it('molfile format symbols (R#, A, Q, D) and real elements (Se, [se]) are kept', () => {
		expect(readStructure(v2000(['C', 'Se', 'C'])).molecule.getAllAtoms()).toBe(3);
		expect(readStructure('c1cc[se]c1').molecule.getAllAtoms()).toBe(5);
		expect(readStructure(v2000(['C', 'D'])).molecule.getAllAtoms()).toBe(2);
	});
	it('[999C] is an absurd isotope; 13C, 14C, 2H and 18F are labels chemists use', () => {
		expect(failure('[999C]')).toMatchObject({ code: 'bad_isotope', atom: 0 });
		expect(failure('OC[3C]')).toMatchObject({ code: 'bad_isotope' }); // fewer nucleons than protons
		for (const labelled of ['[13CH3]O', '[14CH3]O', '[2H]OC', '[18F]CC']) {
			expect(readStructure(labelled).molecule.getAllAtoms()).toBeGreaterThan(0);
		}
	});
});
