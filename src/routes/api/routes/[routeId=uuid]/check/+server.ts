import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import type { CheckAnswer } from '$lib/rules/check/types';
import { routeDocument } from '$lib/server/services/routes';
import { teamRuleLayer } from '$lib/server/services/team-rules-layer';

/**
 * `GET /api/routes/{id}/check` → the `/api/check` answer for every step of the stored route, under
 * the rule overrides of the route's team.
 */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route, project } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const [document, layer] = await Promise.all([
		routeDocument(route),
		teamRuleLayer(project.teamId)
	]);
	const answer: CheckAnswer = { steps: await runChemistry('checkRoute', { document, layer }) };
	return json(answer);
});
