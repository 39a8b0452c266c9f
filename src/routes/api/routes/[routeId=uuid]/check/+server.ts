import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocument } from '$lib/server/services/routes';

/** `GET /api/routes/{id}/check` → the `/api/check` answer for every step of the stored route. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const document = await routeDocument(route);
	return json({ steps: await runChemistry('checkRoute', { document }) });
});
