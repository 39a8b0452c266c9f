// Comments as the route page shows them: threads (a comment and its replies, one level deep) per
// step or for the route, and how many are open. Pure, so the edge, the panel and tests agree.

import type { CommentAnswer } from '$lib/api/answers';

/** A comment that starts a thread, with every reply to it (or to its replies), oldest first. */
export type Thread = { root: CommentAnswer; replies: CommentAnswer[] };

/** The comment a thread starts with: replies to replies are shown under the first comment. */
function rootOf(comment: CommentAnswer, byId: Map<string, CommentAnswer>): CommentAnswer {
	let current = comment;
	const seen = new Set<string>();
	while (current.replyTo && !seen.has(current.id)) {
		seen.add(current.id);
		const parent = byId.get(current.replyTo);
		if (!parent) {
			break; // a reply whose parent is gone starts its own thread rather than vanish
		}
		current = parent;
	}
	return current;
}

/** Threads whose first comment is where `keep` says, oldest first. */
function threadsWhere(
	comments: readonly CommentAnswer[],
	keep: (stepId: string | null) => boolean
): Thread[] {
	const byId = new Map(comments.map((comment) => [comment.id, comment]));
	const threads = new Map<string, Thread>();
	for (const comment of comments) {
		const root = rootOf(comment, byId);
		if (!keep(root.stepId)) {
			continue;
		}
		const thread = threads.get(root.id) ?? { root, replies: [] };
		threads.set(root.id, thread);
		if (root.id !== comment.id) {
			thread.replies.push(comment);
		}
	}
	return [...threads.values()];
}

/** The threads of one step (`stepId`) or of the route itself (`null`), oldest first. */
export function threadsOf(comments: readonly CommentAnswer[], stepId: string | null): Thread[] {
	return threadsWhere(comments, (on) => on === stepId);
}

/** Threads on steps the route no longer has (deleted since): shown, not lost. */
export function threadsOnGoneSteps(
	comments: readonly CommentAnswer[],
	stepIds: ReadonlySet<string>
): Thread[] {
	return threadsWhere(comments, (on) => on !== null && !stepIds.has(on));
}

/**
 * Open comments per step id: those not resolved in a thread not resolved. A resolved thread
 * folds away with its replies, so the count is what the panel shows unfolded.
 */
export function openCountsByStep(comments: readonly CommentAnswer[]): Map<string, number> {
	const byId = new Map(comments.map((comment) => [comment.id, comment]));
	const counts = new Map<string, number>();
	for (const comment of comments) {
		const root = rootOf(comment, byId);
		if (root.stepId === null || comment.resolved || root.resolved) {
			continue;
		}
		counts.set(root.stepId, (counts.get(root.stepId) ?? 0) + 1);
	}
	return counts;
}

/** "1 open comment", "3 open comments". */
export const openCommentsLabel = (count: number) =>
	`${count} open comment${count === 1 ? '' : 's'}`;
