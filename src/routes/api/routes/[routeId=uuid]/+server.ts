import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { RouteAnswer, SavedRouteAnswer } from '$lib/api/answers';
import { VERSION_CONFLICT, type VersionConflictDetails } from '$lib/api/errors';
import { apiError, apiHandler, readJson } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { routeDocumentOr422 } from '$lib/server/route-api';
import { approvedVersionOf } from '$lib/server/services/review';
import { routeDocument, saveRoute, VersionConflict } from '$lib/server/services/routes';

/**
 * `GET /api/routes/{id}` → `{ id, projectId, name, status, version, approvedVersion?, document }`;
 * `approvedVersion` once the route has ever been approved (it stays after an edit ends the approval).
 */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const [document, approvedVersion] = await Promise.all([
		routeDocument(route),
		approvedVersionOf(route.id)
	]);
	const { id, projectId, name, status, version } = route;
	return json({
		id,
		projectId,
		name,
		status,
		version,
		...(approvedVersion === null ? {} : { approvedVersion }),
		document
	} satisfies RouteAnswer);
});

const saveBody = z.object({ version: z.number().int().positive(), document: z.unknown() });

/** `PUT /api/routes/{id}` `{ version, document }` → `{ version }`, or 409 `version_conflict`. */
export const PUT: RequestHandler = apiHandler(async (event) => {
	const { route, user, project } = await requireRouteAction(
		event,
		event.params.routeId,
		'route.edit'
	);
	const body = await readJson(event, saveBody);
	const document = routeDocumentOr422(body.document);
	try {
		const version = await saveRoute(user, route, body.version, document, project.teamId);
		return json({ version } satisfies SavedRouteAnswer);
	} catch (caught) {
		if (caught instanceof VersionConflict) {
			const details: VersionConflictDetails = { currentVersion: caught.currentVersion };
			return apiError(
				409,
				VERSION_CONFLICT,
				`${caught.message} Reload it, or keep your copy as a new route.`,
				details
			);
		}
		throw caught;
	}
});
