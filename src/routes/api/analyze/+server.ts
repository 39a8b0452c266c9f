import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { apiError, apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { analyzeStructure, isStructureError } from '$lib/chem';

const analyzeBodySchema = z.object({
	structure: z.string(),
	depict: z.boolean().optional(),
	/** Atom indices, group ids or PG ids, comma-separated (see src/lib/chem/highlight.ts). */
	highlight: z.string().max(10_000).optional()
});

/**
 * `POST /api/analyze` `{ structure, depict?, highlight? }` →
 * `200 { formula, mass, canonical, groups, protectingGroups, svg? }`; a structure that cannot be
 * read or is chemically impossible → 422 `invalid_structure` with the reason (and SMILES position)
 * in `details`; a highlight naming nothing in the structure → 422 `invalid_highlight`.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const body = await readJson(event, analyzeBodySchema);
	try {
		return json(analyzeStructure(body.structure, { depict: body.depict, highlight: body.highlight }));
	} catch (caught) {
		if (!isStructureError(caught)) throw caught;
		const code = caught.code === 'invalid_highlight' ? 'invalid_highlight' : 'invalid_structure';
		const { position, atom, record } = caught;
		return apiError(422, code, caught.message, { reason: caught.code, position, atom, record });
	}
});
