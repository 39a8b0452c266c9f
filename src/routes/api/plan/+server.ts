import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocumentOr422 } from '$lib/server/route-api';
import { approvedSavedConditions } from '$lib/server/services/planning-library';
import { callerTeamLayer, teamIdField } from '$lib/server/services/team-rules-layer';

// The route document may carry `teamId` beside its own fields; the document's schema ignores it.
const teamChoice = z.object({ teamId: teamIdField });

/**
 * `POST /api/plan` with a route document (and optionally `teamId`, to plan under that team's rule
 * overrides, its added steps following that team's approved saved conditions) →
 * `{ plans: [...], unsolved? }`.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const body = await readJson(event, z.unknown());
	const { teamId } =
		typeof body === 'object' && body !== null && !Array.isArray(body) ? teamChoice.parse(body) : {};
	const document = routeDocumentOr422(body);
	// callerTeamLayer answers 404 for a team the caller is not in, before the library is read.
	const layer = await callerTeamLayer(event, teamId);
	const savedConditions = teamId ? await approvedSavedConditions(teamId) : [];
	return json(await runChemistry('plan', { document, layer, savedConditions }));
});
