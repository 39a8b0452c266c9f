import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';

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
 * in `details`; over a limit of STRUCTURE_LIMITS → 422 `structure_too_large`; a highlight naming
 * nothing in the structure → 422 `invalid_highlight`. Runs on the chemistry pool (503 when it is
 * busy or the time budget runs out). Over the drawing limit, `svg` is left out and
 * `drawingSkipped` says why.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const body = await readJson(event, analyzeBodySchema);
	const options = { depict: body.depict, highlight: body.highlight };
	return json(await runChemistry('analyze', { text: body.structure, options }));
});
