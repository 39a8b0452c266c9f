// Why a quantities request cannot be computed, in words that name the material or field. The API
// answers these with 422 and this code; nothing here knows about HTTP.

export type QuantitiesErrorCode =
	| 'no_limiting'
	| 'two_limiting'
	| 'missing_amount'
	| 'two_amounts'
	| 'no_density'
	| 'no_molar_mass'
	| 'unreadable_structure'
	| 'unknown_solvent'
	| 'log_out_of_order';

/** e.g. `new QuantitiesError('no_density', 'hexanol: …', { material: 'hexanol', field: 'density' })`. */
export class QuantitiesError extends Error {
	constructor(
		readonly code: QuantitiesErrorCode,
		message: string,
		readonly details: { material?: string; field?: string; known?: string[]; reading?: number } = {}
	) {
		super(message);
		this.name = 'QuantitiesError';
	}
}

export function isQuantitiesError(value: unknown): value is QuantitiesError {
	return value instanceof QuantitiesError;
}
