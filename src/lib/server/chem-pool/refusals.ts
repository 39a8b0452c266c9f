// What a chemistry task answers when the input is refused (unreadable, too large, an unknown
// condition): a plain object, so it crosses from the worker thread intact, in the API's terms.
// Errors that are not refusals are bugs and leave the worker as errors (a logged 500).

import { isStructureError, type StructureError } from '../../chem/errors';
import { isQuantitiesError } from '../../quantities/errors';
import { StepStructureError, UnknownConditionError } from '../../rules/check/types';
import { OverrideLayerError } from '../../rules/overrides';
import { RouteFileError } from '../route-sdf';

export type Refusal = { status: 422; code: string; message: string; details?: unknown };

/** The API code for a structure refused for `reason`, e.g. `'too_large'` → `'structure_too_large'`. */
export function codeForStructure(
	reason: string | undefined,
	fallback = 'invalid_structure'
): string {
	if (reason === 'too_large') {
		return 'structure_too_large';
	}
	if (reason === 'invalid_highlight') {
		return 'invalid_highlight';
	}
	return fallback;
}

function structureRefusal(caught: StructureError): Refusal {
	const { position, atom, record, limit } = caught;
	return {
		status: 422,
		code: codeForStructure(caught.code),
		message: caught.message,
		details: { reason: caught.code, position, atom, record, limit }
	};
}

/** The refusal a thrown value stands for, or null when it is a bug, e.g. a StructureError → 422. */
export function refusalOf(caught: unknown): Refusal | null {
	if (isStructureError(caught)) {
		return structureRefusal(caught);
	}
	if (caught instanceof OverrideLayerError) {
		return {
			status: 422,
			code: 'invalid_team_rules',
			message: `${caught.team}'s rule overrides no longer fit the rule table, so nothing was checked: ${caught.problems.join('; ')}. A lead can correct or remove them on the team's rules page.`,
			details: { problems: caught.problems }
		};
	}
	if (caught instanceof UnknownConditionError) {
		return { status: 422, code: 'unknown_condition', message: caught.message };
	}
	if (caught instanceof StepStructureError) {
		const details = { step: caught.stepId, role: caught.role, reason: caught.reason };
		return { status: 422, code: codeForStructure(caught.reason), message: caught.message, details };
	}
	if (isQuantitiesError(caught)) {
		return { status: 422, code: caught.code, message: caught.message, details: caught.details };
	}
	if (caught instanceof RouteFileError) {
		return {
			status: 422,
			code: codeForStructure(caught.reason, 'invalid_import'),
			message: caught.message,
			details: { record: caught.record, problems: caught.details, reason: caught.reason }
		};
	}
	return null;
}
