// One error type for every way a structure can fail to be read, so callers (the API, imports,
// scripts) can answer with a code and a sentence instead of a toolkit's stack trace.

import type { StructureLimit } from './limits';

export type StructureLimitPassed = { name: StructureLimit; max: number; found: number };

export type StructureErrorCode =
	| 'empty'
	| 'too_large'
	| 'unknown_element'
	| 'bad_isotope'
	| 'unknown_format'
	| 'smiles_syntax'
	| 'unclosed_ring'
	| 'molfile_syntax'
	| 'sdf_syntax'
	| 'bad_valence'
	| 'invalid_structure'
	| 'invalid_highlight';

/** What went wrong reading a structure, e.g. `new StructureError('unclosed_ring', 'Ring bond 1 is never closed.', { position: 4 })`. */
export class StructureError extends Error {
	readonly code: StructureErrorCode;
	/** 0-based character offset in SMILES text, when the reader knows it. */
	readonly position?: number;
	/** 0-based atom index, when one atom is to blame (e.g. a pentavalent carbon). */
	readonly atom?: number;
	/** 1-based SDF record, when the text held several. */
	readonly record?: number;
	/** For `too_large`: which limit of STRUCTURE_LIMITS was passed, its value and what was found. */
	readonly limit?: StructureLimitPassed;

	constructor(
		code: StructureErrorCode,
		message: string,
		where: { position?: number; atom?: number; record?: number; limit?: StructureLimitPassed } = {}
	) {
		super(message);
		this.name = 'StructureError';
		this.code = code;
		if (where.position !== undefined) {
			this.position = where.position;
		}
		if (where.atom !== undefined) {
			this.atom = where.atom;
		}
		if (where.record !== undefined) {
			this.record = where.record;
		}
		if (where.limit !== undefined) {
			this.limit = where.limit;
		}
	}
}

/** True for errors this module raised, e.g. `isStructureError(caught)` in a catch block. */
export function isStructureError(value: unknown): value is StructureError {
	return value instanceof StructureError;
}

/** Strips openchemlib's Java class prefix from a thrown value, e.g. `'Class$S19: SmilesParser: x'` → `'x'`. */
export function toolkitMessage(caught: unknown): string {
	const raw = caught instanceof Error ? caught.message : String(caught);
	return raw
		.replace(/^(?:[\w$]+:\s*)?(?:Class\$\w+:\s*)?/, '')
		.replace(/^SmilesParser:\s*/, '')
		.trim();
}
