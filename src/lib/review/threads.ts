// Comments arranged as conversations: each thread is a top-level comment with every reply under
// it (replies to replies included), oldest first, and threads are sorted to the step they belong to.
// Pure: the review copy and the route page can both read it.

import type { CommentAnswer } from '../api/answers';

export type CommentThread = { root: CommentAnswer; replies: CommentAnswer[] };

export type SortedThreads = {
	/** Threads on each step that is still in the route, by step id. */
	byStep: Map<string, CommentThread[]>;
	/** Threads on the route as a whole. */
	route: CommentThread[];
	/** Threads on steps the route no longer has: kept, never dropped without a word. */
	onRemovedSteps: CommentThread[];
};

/**
 * Threads of `comments` (oldest first, as `listComments` gives them), e.g. a, b replying to a and
 * c replying to b → one thread `{ root: a, replies: [b, c] }`. A reply joins its parent's thread
 * when the parent came before it; otherwise (a parent that is gone, or stored data that loops) it
 * begins a thread of its own, so every comment is printed exactly once.
 */
export function commentThreads(comments: readonly CommentAnswer[]): CommentThread[] {
	const threadOf = new Map<string, CommentThread>();
	const threads: CommentThread[] = [];
	for (const comment of comments) {
		const parentThread = comment.replyTo ? threadOf.get(comment.replyTo) : undefined;
		if (parentThread) {
			parentThread.replies.push(comment);
			threadOf.set(comment.id, parentThread);
		} else {
			const thread = { root: comment, replies: [] };
			threads.push(thread);
			threadOf.set(comment.id, thread);
		}
	}
	return threads;
}

/** Threads sorted to the steps of a route (by the thread's first comment), the route's own, and the rest. */
export function sortThreads(
	comments: readonly CommentAnswer[],
	stepIds: Iterable<string>
): SortedThreads {
	const steps = new Set(stepIds);
	const sorted: SortedThreads = { byStep: new Map(), route: [], onRemovedSteps: [] };
	for (const thread of commentThreads(comments)) {
		const stepId = thread.root.stepId;
		if (stepId === null) {
			sorted.route.push(thread);
		} else if (steps.has(stepId)) {
			sorted.byStep.set(stepId, [...(sorted.byStep.get(stepId) ?? []), thread]);
		} else {
			sorted.onRemovedSteps.push(thread);
		}
	}
	return sorted;
}
