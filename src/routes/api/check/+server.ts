import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { STRUCTURE_LIMITS } from '$lib/chem/limits';
import { FIELD_LIMITS } from '$lib/schemas/limits';
import { runChemistry } from '$lib/server/chem-pool/pool';
import type { CheckAnswer } from '$lib/rules/check/types';
import { callerTeamLayer, teamIdField } from '$lib/server/services/team-rules-layer';

const MAX_STRUCTURE = STRUCTURE_LIMITS.maxTextBytes;
const checkBody = z.object({
	steps: z
		.array(
			z.object({
				id: z.string().min(1).max(64),
				substrate: z.string().max(MAX_STRUCTURE),
				product: z.string().max(MAX_STRUCTURE),
				conditions: z.array(z.string().max(64)).max(30).optional(),
				reagents: z.string().max(FIELD_LIMITS.stepReagents.max).optional()
			})
		)
		.min(1, 'Send at least one step.')
		.max(200, 'Send at most 200 steps at a time.'),
	/** Apply this team's rule overrides (the caller must be in the team). */
	teamId: teamIdField
});

/**
 * `POST /api/check` `{ steps: [{ id, substrate, product, conditions?, reagents? }], teamId? }` →
 * `{ steps: [...] }`; with `teamId`, under that team's rule overrides.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const { steps, teamId } = await readJson(event, checkBody);
	const layer = await callerTeamLayer(event, teamId);
	// Unknown condition ids and unreadable structures come back as 422 from the pool.
	const answer: CheckAnswer = { steps: await runChemistry('checkSteps', { steps, layer }) };
	return json(answer);
});
