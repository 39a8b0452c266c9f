import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { ReviewAnswer } from '$lib/api/answers';
import { reviewBody } from '$lib/review/contract';
import { apiHandler, readJson } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { takeReviewAction } from '$lib/server/services/review-actions';

/**
 * `POST /api/routes/{id}/review` `{ action, reviewers?, note?, version? }` → `{ status, version }`.
 * Any member reaches the service (another team: 404); it checks the action's grant (403), the
 * status (409 `invalid_transition`), the body (422) and the version (409 `version_conflict`).
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { user, role, route, project } = await requireRouteAction(
		event,
		event.params.routeId,
		'project.read'
	);
	const body = await readJson(event, reviewBody);
	const answer: ReviewAnswer = await takeReviewAction(user, role, route, project, body);
	return json(answer);
});
