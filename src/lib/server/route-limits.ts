// Size limits on a route as it is saved or created, checked on the text of every structure (no
// parsing, so this runs on the request thread). A structure over a limit would stop whoever
// opens the route, so it is refused; one that is merely unreadable (the chemist is still
// drawing) is stored, and the check reports it per step.

import { isStructureError } from '../chem/errors';
import { STRUCTURE_LIMITS } from '../chem/limits';
import { structureSize } from '../chem/structure-size';
import type { RouteDocument } from '../route/document';
import { ApiFailure } from './api';

/**
 * Throws ApiFailure 422 `structure_too_large` naming the intermediate, `route_too_large`, or
 * `invalid_structure` for a NUL character.
 */
export function assertRouteWithinLimits(document: RouteDocument): void {
	let heavyAtoms = 0;
	for (const node of document.intermediates) {
		if (node.structure.trim() === '') {
			continue;
		}
		// No structure format has a NUL, and databases refuse it in text (SQLite cuts the SQL).
		if (node.structure.includes('\u0000')) {
			throw new ApiFailure(
				422,
				'invalid_structure',
				`Intermediate “${node.label ?? node.id}” holds a NUL character, which no structure format allows.`,
				{ intermediate: node.id }
			);
		}
		try {
			heavyAtoms += structureSize(node.structure).heavyAtoms;
		} catch (caught) {
			if (!isStructureError(caught) || caught.code !== 'too_large') {
				continue;
			}
			throw new ApiFailure(
				422,
				'structure_too_large',
				`Intermediate “${node.label ?? node.id}” is too large: ${caught.message}`,
				{ intermediate: node.id, limit: caught.limit }
			);
		}
	}
	const max = STRUCTURE_LIMITS.maxRouteHeavyAtoms;
	if (heavyAtoms > max) {
		throw new ApiFailure(
			422,
			'route_too_large',
			`The route's intermediates have ${heavyAtoms.toLocaleString('en')} heavy atoms together; a route may have at most ${max.toLocaleString('en')}.`,
			{ limit: { name: 'maxRouteHeavyAtoms', max, found: heavyAtoms } }
		);
	}
}
