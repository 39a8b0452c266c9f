// Decides what kind of structure text we were given, from the text alone. openchemlib's own
// `fromText` guesses too eagerly (almost any word parses as *something*), so we never use it.

import { StructureError } from './errors';
import { STRUCTURE_LIMITS } from './limits';

export type StructureFormat = 'smiles' | 'molfile-v2000' | 'molfile-v3000' | 'sdf';

/** Structure text longer than this is refused before any parsing (1 MB, in UTF-8 bytes). */
export const MAX_STRUCTURE_BYTES = STRUCTURE_LIMITS.maxTextBytes;

const SDF_DATA_HEADER = /^>\s*.*<[^>]+>/m;
const RECORD_END = /^\$\$\$\$\s*$/m;

/** Guesses the format from the text, e.g. `detectFormat('CCO')` → `'smiles'`; throws StructureError when nothing fits. */
export function detectFormat(text: string): StructureFormat {
	if (text.trim() === '') {
		throw new StructureError(
			'empty',
			'The structure is empty: paste a SMILES string, a molfile or an SDF record.'
		);
	}
	if (isOverByteLimit(text)) {
		throw new StructureError(
			'too_large',
			`The structure text is over ${MAX_STRUCTURE_BYTES / 1024 / 1024} MB; send one molecule at a time.`,
			{
				limit: { name: 'maxTextBytes', max: MAX_STRUCTURE_BYTES, found: text.length }
			}
		);
	}
	const hasMolEnd = /^M {2}END\s*$/m.test(text);
	if (hasMolEnd && (RECORD_END.test(text) || SDF_DATA_HEADER.test(text))) {
		return 'sdf';
	}
	if (/V3000/.test(text) && /M {2}V30 BEGIN CTAB/.test(text)) {
		return 'molfile-v3000';
	}
	if (/^.{33,39}V2000\s*$/m.test(text)) {
		return 'molfile-v2000';
	}
	const lines = text.trim().split(/\r?\n/);
	// A SMILES is one line; a title after whitespace is allowed by the SMILES convention.
	if (lines.length === 1) {
		return 'smiles';
	}
	if (hasMolEnd || /V2000|V3000/.test(text)) {
		throw new StructureError(
			'molfile_syntax',
			'This looks like a molfile, but its counts line (line 4, ending in V2000 or V3000) is missing or malformed.'
		);
	}
	throw new StructureError(
		'unknown_format',
		'The text is neither a one-line SMILES nor a molfile/SDF record (no "M  END" line was found).'
	);
}

/** Whether the UTF-8 form of the text exceeds the limit, without Node's Buffer (the core also runs in a browser). */
function isOverByteLimit(text: string): boolean {
	// A UTF-16 unit is 1 to 3 UTF-8 bytes: only encode when the length alone cannot decide.
	if (text.length > MAX_STRUCTURE_BYTES) {
		return true;
	}
	if (text.length * 3 <= MAX_STRUCTURE_BYTES) {
		return false;
	}
	return new TextEncoder().encode(text).length > MAX_STRUCTURE_BYTES;
}
