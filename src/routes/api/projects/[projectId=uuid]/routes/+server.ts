import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { CreatedRouteAnswer, RouteListAnswer } from '$lib/api/answers';
import { apiHandler, readJson } from '$lib/server/api';
import { requireProjectAction } from '$lib/server/auth/guards';
import { routeDocumentOr422 } from '$lib/server/route-api';
import { createRoute, listRoutes } from '$lib/server/services/routes';

/** `GET /api/projects/{projectId}/routes` → `{ routes: [{ id, name, status, version, updatedAt }] }`. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { project } = await requireProjectAction(event, event.params.projectId, 'project.read');
	const routes = await listRoutes(project.id);
	const answer: RouteListAnswer = {
		routes: routes.map(({ id, name, status, version, updatedAt }) => ({
			id,
			name,
			status,
			version,
			updatedAt
		}))
	};
	return json(answer);
});

/** `POST /api/projects/{projectId}/routes` (route document) → `201 { id, version }`. */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { project, user } = await requireProjectAction(event, event.params.projectId, 'route.edit');
	const document = routeDocumentOr422(await readJson(event, z.unknown()));
	const route = await createRoute(user, project, document);
	const created: CreatedRouteAnswer = { id: route.id, version: route.version };
	return json(created, { status: 201 });
});
