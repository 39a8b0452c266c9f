import { Op } from 'sequelize';
import type { CommentAnswer } from '../../api/answers';
import { Comment, dbReady, User } from '../db';
import { renderMarkdown } from '../markdown';
import { openCommentTotal, type Threaded } from '../../review/threads';

// Reading comments. Writing them (with the mails they cause) is in comment-writes.ts.

/** A stored comment in the API's shape; the HTML is rendered from the Markdown on every read. */
export function commentAnswer(comment: Comment): CommentAnswer {
	return {
		id: comment.id,
		stepId: comment.stepKey,
		replyTo: comment.replyToId,
		author: comment.author ? { id: comment.author.id, name: comment.author.name } : null,
		body: comment.body,
		html: renderMarkdown(comment.body),
		resolved: comment.resolved,
		createdAt: comment.createdAt.toISOString(),
		editedAt: comment.editedAt ? comment.editedAt.toISOString() : null
	};
}

/** Every comment on a route (its steps' and its own), oldest first. */
export async function listComments(routeId: string): Promise<CommentAnswer[]> {
	await dbReady();
	const comments = await Comment.findAll({
		where: { routeId },
		order: [
			['createdAt', 'ASC'],
			['id', 'ASC']
		],
		include: [{ model: User, as: 'author', attributes: ['id', 'name'] }]
	});
	return comments.map(commentAnswer);
}

type CommentRow = Pick<Comment, 'id' | 'routeId' | 'stepKey' | 'replyToId' | 'resolved'>;

/**
 * Open comments per route by the route page's rule (`openComments`: not resolved, in a thread not
 * resolved), e.g. `{ [routeId]: 3 }`; routes with no comments are absent.
 */
export async function openCommentCounts(routeIds: string[]): Promise<Record<string, number>> {
	if (routeIds.length === 0) {
		return {};
	}
	await dbReady();
	// The rule needs each thread's first comment, so the rows are counted here, not by COUNT(*).
	const rows = (await Comment.findAll({
		attributes: ['id', 'routeId', 'stepKey', 'replyToId', 'resolved'],
		where: { routeId: { [Op.in]: routeIds } },
		order: [
			['createdAt', 'ASC'],
			['id', 'ASC']
		],
		raw: true
	})) as unknown as CommentRow[];
	const byRoute = new Map<string, Threaded[]>();
	for (const row of rows) {
		const comment = {
			id: row.id,
			stepId: row.stepKey,
			replyTo: row.replyToId,
			resolved: !!row.resolved
		};
		byRoute.set(row.routeId, [...(byRoute.get(row.routeId) ?? []), comment]);
	}
	return Object.fromEntries(
		[...byRoute].map(([routeId, comments]) => [routeId, openCommentTotal(comments)])
	);
}
