import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { UpdatedCommentAnswer } from '$lib/api/answers';
import { commentPatchBody } from '$lib/review/contract';
import { apiHandler, readJson } from '$lib/server/api';
import { requireCommentAction } from '$lib/server/auth/guards';
import { updateComment } from '$lib/server/services/comment-writes';
import { commentAnswer } from '$lib/server/services/comments';

/**
 * `PATCH /api/comments/{id}` `{ body?, resolved? }` → the comment as it now stands. The body only
 * by its author; resolving and reopening by any role that may comment; viewer 403.
 */
export const PATCH: RequestHandler = apiHandler(async (event) => {
	const { user, role, comment, route, project } = await requireCommentAction(
		event,
		event.params.commentId,
		'route.comment'
	);
	const patch = await readJson(event, commentPatchBody);
	const updated = await updateComment(user, role, comment, patch, { route, project });
	return json(commentAnswer(updated) satisfies UpdatedCommentAnswer);
});
