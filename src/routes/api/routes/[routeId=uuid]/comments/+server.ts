import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { CommentsAnswer, CreatedCommentAnswer } from '$lib/api/answers';
import { newCommentBody } from '$lib/review/contract';
import { apiHandler, readJson } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { addComment } from '$lib/server/services/comment-writes';
import { listComments } from '$lib/server/services/comments';

/** `GET /api/routes/{id}/comments` → `{ comments: [...] }`, oldest first (every role). */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route } = await requireRouteAction(event, event.params.routeId, 'project.read');
	return json({ comments: await listComments(route.id) } satisfies CommentsAnswer);
});

/**
 * `POST /api/routes/{id}/comments` `{ body, stepId?, replyTo? }` → 201 `{ id }` (lead, chemist,
 * reviewer); a step the route does not have, or a reply to a comment not on it → 422.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { user, route, project } = await requireRouteAction(
		event,
		event.params.routeId,
		'route.comment'
	);
	const body = await readJson(event, newCommentBody);
	const comment = await addComment(user, route, project, body);
	return json({ id: comment.id } satisfies CreatedCommentAnswer, { status: 201 });
});
