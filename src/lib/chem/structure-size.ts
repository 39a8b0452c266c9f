// Counting a structure's atoms and bonds from its text alone, before openchemlib parses it:
// the counts line of a molfile can declare any number, and openchemlib allocates arrays for
// what it declares. Unknown atom symbols are refused here too, with the place they were found.
// Sizes are checked before symbols: a text that is both too large and wrong is refused for size.

import { isHydrogenSymbol, isMolfileSymbol, isSmilesSymbol } from './elements';
import { StructureError } from './errors';
import { detectFormat } from './format';
import { STRUCTURE_LIMITS } from './limits';
import { splitSdf } from './sdf';
import { smilesAtoms } from './smiles-atoms';

export type StructureSize = { atoms: number; bonds: number; heavyAtoms: number };

type Where = { record?: number };

/** Counts and checks a SMILES (without its title), e.g. `smilesSize('CCO')` → `{ atoms: 3, bonds: 2, heavyAtoms: 3 }`. */
export function smilesSize(smiles: string, offset = 0): StructureSize {
	const tokens = smilesAtoms(smiles);
	const heavyAtoms = tokens.filter((token) => !isHydrogenSymbol(token.symbol)).length;
	const bonds = tokens.length - 1 + ringClosures(smiles);
	const size = { atoms: tokens.length, bonds, heavyAtoms };
	checkSize(size, {});
	const unknown = tokens.find((token) => !isSmilesSymbol(token.symbol));
	if (unknown) {
		throw new StructureError(
			'unknown_element',
			`“${unknown.symbol}” at character ${offset + unknown.position + 1} is not an element symbol.`,
			{ position: offset + unknown.position }
		);
	}
	return size;
}

/** Ring-closure bonds: each digit (or %nn) outside brackets opens or closes one. */
function ringClosures(smiles: string): number {
	const outside = smiles.replace(/\[[^\]]*\]/g, '').replace(/%\d\d/g, '0');
	return Math.floor((outside.match(/\d/g)?.length ?? 0) / 2);
}

/**
 * Counts and checks a molfile (V2000 or V3000): the declared counts, the atom and bond lines
 * actually present, and every atom symbol. Throws StructureError; returns the sizes found.
 */
export function molfileSize(text: string, where: Where = {}): StructureSize {
	const lines = text.replace(/\r\n?/g, '\n').split('\n');
	const counts = lines[3] ?? '';
	return /V3000\s*$/.test(counts) || /^M {2}V30 /m.test(text)
		? v3000Size(lines, where)
		: v2000Size(lines, counts, where);
}

function v2000Size(lines: string[], counts: string, where: Where): StructureSize {
	const declaredAtoms = Number(counts.slice(0, 3)) || 0;
	const declaredBonds = Number(counts.slice(3, 6)) || 0;
	checkSize({ atoms: declaredAtoms, bonds: declaredBonds, heavyAtoms: 0 }, where, 'declares');
	const symbols = lines.slice(4, 4 + declaredAtoms).map((line) => line.slice(31, 34).trim());
	const heavyAtoms = symbols.filter((symbol) => symbol !== '' && !isHydrogenSymbol(symbol)).length;
	const size = { atoms: declaredAtoms, bonds: declaredBonds, heavyAtoms };
	checkSize(size, where);
	// An empty symbol is a short line: the parser reports the truncation.
	symbols.forEach((symbol, atom) => {
		if (symbol !== '') {
			checkMolfileSymbol(symbol, atom, where);
		}
	});
	return size;
}

function v3000Size(lines: string[], where: Where): StructureSize {
	const declared = /^M {2}V30 COUNTS\s+(\d+)\s+(\d+)/m.exec(lines.join('\n'));
	if (declared) {
		const size = { atoms: Number(declared[1]), bonds: Number(declared[2]), heavyAtoms: 0 };
		checkSize(size, where, 'declares');
	}
	let block: 'ATOM' | 'BOND' | null = null;
	let atoms = 0;
	let bonds = 0;
	let heavyAtoms = 0;
	let continued = false;
	let unknown: { symbol: string; atom: number } | null = null;
	for (const line of lines) {
		if (!line.startsWith('M  V30 ')) {
			continue;
		}
		const body = line.slice(7).trim();
		const wasContinued = continued;
		continued = body.endsWith('-');
		if (wasContinued) {
			continue;
		}
		const marker = /^(BEGIN|END) (ATOM|BOND)\b/.exec(body);
		if (marker) {
			block = marker[1] === 'BEGIN' ? (marker[2] as 'ATOM' | 'BOND') : null;
			continue;
		}
		if (block === 'BOND') {
			bonds += 1;
		}
		if (block !== 'ATOM') {
			continue;
		}
		atoms += 1;
		const symbol = body.split(/\s+/)[1] ?? '';
		// Atom lists ("[C,N]", "NOT [O,S]") are queries built from element symbols.
		const isList = /^(NOT\s*)?\[/.test(symbol);
		if (!isList && !unknown && !isMolfileSymbol(symbol)) {
			unknown = { symbol, atom: atoms - 1 };
		}
		if (!isHydrogenSymbol(symbol)) {
			heavyAtoms += 1;
		}
		// Stop counting once a limit is passed: a huge block need not be read to its end.
		if (atoms > STRUCTURE_LIMITS.maxAtoms || bonds > STRUCTURE_LIMITS.maxBonds) {
			break;
		}
	}
	const size = { atoms, bonds, heavyAtoms };
	checkSize(size, where);
	if (unknown) {
		checkMolfileSymbol(unknown.symbol, unknown.atom, where);
	}
	return size;
}

/**
 * Counts and checks any structure text as the reader sees it (the first word of a SMILES, the
 * first record of an SDF), e.g. `structureSize('CCO').heavyAtoms` → 3. Throws StructureError.
 */
export function structureSize(text: string): StructureSize {
	const format = detectFormat(text);
	if (format === 'smiles') {
		const offset = text.length - text.trimStart().length;
		return smilesSize(text.trim().split(/\s+/)[0]!, offset);
	}
	if (format === 'sdf') {
		return molfileSize(splitSdf(text)[0]!.molfile, { record: 1 });
	}
	return molfileSize(text);
}

function checkMolfileSymbol(symbol: string, atom: number, where: Where): void {
	if (isMolfileSymbol(symbol)) {
		return;
	}
	const inRecord = where.record === undefined ? '' : ` of SDF record ${where.record}`;
	throw new StructureError(
		'unknown_element',
		`Atom ${atom + 1}${inRecord} has the symbol “${symbol}”, which is not an element symbol.`,
		{ atom, record: where.record }
	);
}

const LIMITS_IN_ORDER = [
	['atoms', 'maxAtoms', 'atoms'],
	['bonds', 'maxBonds', 'bonds'],
	['heavyAtoms', 'maxHeavyAtoms', 'heavy (non-hydrogen) atoms']
] as const;

/** Throws `too_large` naming the first limit the size passes. */
function checkSize(size: StructureSize, where: Where, verb: 'declares' | 'has' = 'has'): void {
	for (const [field, limit, noun] of LIMITS_IN_ORDER) {
		const max = STRUCTURE_LIMITS[limit];
		if (size[field] <= max) {
			continue;
		}
		const inRecord = where.record === undefined ? '' : ` (SDF record ${where.record})`;
		throw new StructureError(
			'too_large',
			`The structure ${verb} ${size[field].toLocaleString('en')} ${noun}${inRecord}; Orthogon reads at most ${max.toLocaleString('en')} ${noun} per structure.`,
			{ record: where.record, limit: { name: limit, max, found: size[field] } }
		);
	}
}
