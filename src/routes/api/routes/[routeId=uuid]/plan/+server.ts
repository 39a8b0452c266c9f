import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocumentOr422 } from '$lib/server/route-api';
import { approvedSavedConditions } from '$lib/server/services/planning-library';
import { routeDocument } from '$lib/server/services/routes';
import { teamRuleLayer } from '$lib/server/services/team-rules-layer';

/**
 * `POST /api/routes/{id}/plan` → the `/api/plan` answer for the stored route (reading it is
 * enough), under the rule overrides of the route's team; the added steps follow the team's approved
 * saved conditions where the re-check allows.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { route, project } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const [stored, layer, savedConditions] = await Promise.all([
		routeDocument(route),
		teamRuleLayer(project.teamId),
		approvedSavedConditions(project.teamId)
	]);
	// A stored route may be half drawn; it is validated like a posted one.
	const document = routeDocumentOr422(stored);
	return json(await runChemistry('plan', { document, layer, savedConditions }));
});
