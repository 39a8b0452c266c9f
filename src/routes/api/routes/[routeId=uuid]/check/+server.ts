import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import type { CheckAnswer } from '$lib/rules/check/types';
import { routeDocument } from '$lib/server/services/routes';

/** `GET /api/routes/{id}/check` → the `/api/check` answer for every step of the stored route. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const document = await routeDocument(route);
	const answer: CheckAnswer = { steps: await runChemistry('checkRoute', { document }) };
	return json(answer);
});
