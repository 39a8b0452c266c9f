import { Op, fn, col } from 'sequelize';
import type { CommentAnswer } from '../../api/answers';
import { Comment, dbReady, User } from '../db';
import { renderMarkdown } from '../markdown';

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

/** Open (unresolved) comments per route, e.g. `{ [routeId]: 3 }`; routes without any are absent. */
export async function openCommentCounts(routeIds: string[]): Promise<Record<string, number>> {
	if (routeIds.length === 0) {
		return {};
	}
	await dbReady();
	const rows = (await Comment.findAll({
		attributes: ['routeId', [fn('COUNT', col('id')), 'open']],
		where: { routeId: { [Op.in]: routeIds }, resolved: false },
		group: ['routeId'],
		raw: true
	})) as unknown as { routeId: string; open: number | string }[];
	// PostgreSQL returns COUNT as a string (bigint); SQLite as a number.
	return Object.fromEntries(rows.map((row) => [row.routeId, Number(row.open)]));
}
