// Reading structure text into a validated openchemlib Molecule. The format is decided from the
// text (format.ts), each format is parsed explicitly, and every failure becomes a StructureError.

import { Molecule } from 'openchemlib';
import { StructureError, toolkitMessage } from './errors';
import { detectFormat, type StructureFormat } from './format';
import { splitSdf } from './sdf';
import { smilesAtoms } from './smiles-atoms';
import { molfileSize, smilesSize } from './structure-size';
import { validateMolecule } from './validate';

export type ReadOptions = {
	/** Invent 2D coordinates and read stereo for a SMILES (needed to draw it or for a stereo-aware key). */
	coordinates?: boolean;
	/** Keep a SMILES's stereo without inventing coordinates (to transform it and write it out again). */
	stereo?: boolean;
	/**
	 * Collect openchemlib's validate() warnings (default true). Perception drops them, and
	 * validate() perceives stereo (~2 ms a molecule, most of a cold perception); errors are the same
	 * either way because its only fatal check (valence) repeats one validateMolecule makes first.
	 */
	warnings?: boolean;
};

export type ParsedStructure = {
	molecule: Molecule;
	format: StructureFormat;
	/** Problems that do not stop perception, e.g. an over-specified stereo centre. */
	warnings: string[];
	/** SDF data fields of this record (empty for SMILES and plain molfiles). */
	fields: Record<string, string>;
	/** The SMILES as parsed (without a trailing title), when the input was SMILES. */
	smiles?: string;
};

/** Reads the one structure in the text (the first record of an SDF), e.g. `readStructure('OCC(=O)O')`. */
export function readStructure(text: string, options: ReadOptions = {}): ParsedStructure {
	const format = detectFormat(text);
	if (format === 'sdf') {
		const first = splitSdf(text)[0]!;
		return { ...readMolfile(first.molfile, 'sdf', 1, options), fields: first.fields };
	}
	if (format === 'smiles') {
		return readSmiles(text, options);
	}
	return readMolfile(text, format, undefined, options);
}

/** Reads every record of an SDF (or the single structure of any other text), e.g. `readStructures(sdfText).length` → 3. */
export function readStructures(text: string, options: ReadOptions = {}): ParsedStructure[] {
	if (detectFormat(text) !== 'sdf') {
		return [readStructure(text, options)];
	}
	return splitSdf(text).map((record, index) => ({
		...readMolfile(record.molfile, 'sdf', index + 1, options),
		fields: record.fields
	}));
}

function readSmiles(text: string, options: ReadOptions): ParsedStructure {
	const offset = text.length - text.trimStart().length;
	// SMILES may carry a title after whitespace; the structure is the first word.
	const smiles = text.trim().split(/\s+/)[0]!;
	checkSmilesLexically(smiles, offset);
	// Atom counts and symbols before openchemlib: a 10,000-atom SMILES takes it minutes.
	smilesSize(smiles, offset);
	let molecule: Molecule;
	try {
		molecule = options.coordinates
			? Molecule.fromSmiles(smiles)
			: Molecule.fromSmiles(smiles, { noCoordinates: true, noStereo: !options.stereo });
	} catch (caught) {
		throw smilesError(caught, offset);
	}
	if (molecule.getAllAtoms() === 0) {
		throw new StructureError('empty', 'The SMILES holds no atoms.');
	}
	const tokens = smilesAtoms(smiles);
	const warnings = validateMolecule(molecule, {
		describeAtom: (atom) => {
			const token = tokens[atom];
			return token
				? `atom ${atom + 1} (${token.symbol}, at character ${offset + token.position + 1})`
				: `atom ${atom + 1}`;
		},
		positionOf: (atom) => (tokens[atom] ? offset + tokens[atom]!.position : undefined),
		wasWrittenAromatic: (atom) => tokens[atom]?.aromatic ?? false,
		warnings: options.warnings
	});
	return { molecule, format: 'smiles', warnings, fields: {}, smiles };
}

/**
 * What openchemlib lets through but a SMILES cannot hold: characters outside the SMILES
 * alphabet, a "%" without two digits, and "(" never closed (it reads "C%" as methane).
 */
function checkSmilesLexically(smiles: string, offset: number): void {
	const at = (i: number, what: string) =>
		new StructureError(
			'smiles_syntax',
			`The SMILES cannot be read: ${what} at character ${offset + i + 1}.`,
			{ position: offset + i }
		);
	const open: number[] = [];
	for (let i = 0; i < smiles.length; i++) {
		const ch = smiles[i]!;
		if (!/[A-Za-z0-9@+\-[\]()=#$:/\\.%*~]/.test(ch)) {
			throw at(i, `unexpected character ${JSON.stringify(ch)}`);
		}
		if (ch === '%' && !/^%\d\d/.test(smiles.slice(i))) {
			throw at(i, 'a "%" ring bond needs two digits');
		}
		if (ch === '(') {
			open.push(i);
		}
		if (ch === ')' && open.pop() === undefined) {
			throw at(i, 'a ")" without its "("');
		}
	}
	if (open.length > 0) {
		throw at(open[0]!, 'a "(" that is never closed');
	}
}

function smilesError(caught: unknown, offset: number): StructureError {
	const message = toolkitMessage(caught);
	const found = /position\s*:?\s*(\d+)/i.exec(message);
	const position = found ? offset + Number(found[1]) : undefined;
	const where = position === undefined ? '' : ` at character ${position + 1}`;
	const what = message.replace(/[;,.]?\s*position\s*:?\s*\d+\.?/i, '').trim();
	if (/ring closure/i.test(what)) {
		return new StructureError(
			'unclosed_ring',
			`The SMILES has a ring bond that is never closed (${what})${where}.`,
			{ position }
		);
	}
	return new StructureError('smiles_syntax', `The SMILES cannot be read: ${what}${where}.`, {
		position
	});
}

function readMolfile(
	text: string,
	format: StructureFormat,
	record?: number,
	options: ReadOptions = {}
): ParsedStructure {
	const inRecord = record === undefined ? '' : ` (SDF record ${record})`;
	const declared = declaredAtomCount(text);
	if (declared === null) {
		throw new StructureError(
			'molfile_syntax',
			`The molfile counts line is missing or malformed${inRecord}.`,
			{ record }
		);
	}
	if (declared === 0) {
		throw new StructureError('empty', `The molfile holds no atoms${inRecord}.`, { record });
	}
	// Declared and actual counts before openchemlib, which allocates whatever the counts line says.
	molfileSize(text, { record });
	let molecule: Molecule;
	try {
		molecule = Molecule.fromMolfile(text);
	} catch (caught) {
		throw new StructureError(
			'molfile_syntax',
			`The molfile cannot be read${inRecord}: ${toolkitMessage(caught)}.`,
			{ record }
		);
	}
	if (molecule.getAllAtoms() !== declared) {
		throw new StructureError(
			'molfile_syntax',
			`The molfile declares ${declared} atoms but ${molecule.getAllAtoms()} could be read${inRecord}; is it truncated?`,
			{ record }
		);
	}
	const warnings = validateMolecule(molecule, {
		describeAtom: (atom) => `atom ${atom + 1} (${molecule.getAtomLabel(atom)})${inRecord}`,
		positionOf: () => undefined,
		wasWrittenAromatic: () => false,
		record,
		warnings: options.warnings
	});
	return { molecule, format, warnings, fields: {} };
}

/** Atom count from the counts line (V2000) or the COUNTS line (V3000); null when neither is there. */
function declaredAtomCount(text: string): number | null {
	const lines = text.replace(/\r\n?/g, '\n').split('\n');
	const v3000 = /^M {2}V30 COUNTS\s+(\d+)\s+(\d+)/m.exec(text);
	if (v3000) {
		return Number(v3000[1]);
	}
	const counts = lines[3];
	if (counts === undefined || !/V2000\s*$/.test(counts)) {
		return null;
	}
	const atoms = Number(counts.slice(0, 3));
	return Number.isInteger(atoms) && counts.slice(0, 3).trim() !== '' ? atoms : null;
}
