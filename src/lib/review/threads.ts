// Comments arranged as conversations: each thread is a top-level comment with every reply under
// it (replies to replies included), oldest first, and threads are sorted to the step they belong to.
// Pure: the review copy and the route page can both read it.

import type { CommentAnswer } from '../api/answers';

/** What threading reads of a comment: the server's rows and the API's answers both have it. */
export type Threaded = Pick<CommentAnswer, 'id' | 'stepId' | 'replyTo' | 'resolved'>;

export type CommentThread<C extends Threaded = CommentAnswer> = { root: C; replies: C[] };

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
export function commentThreads<C extends Threaded>(comments: readonly C[]): CommentThread<C>[] {
	const threadOf = new Map<string, CommentThread<C>>();
	const threads: CommentThread<C>[] = [];
	for (const comment of comments) {
		const parentThread = comment.replyTo ? threadOf.get(comment.replyTo) : undefined;
		if (parentThread) {
			parentThread.replies.push(comment);
			threadOf.set(comment.id, parentThread);
		} else {
			const thread: CommentThread<C> = { root: comment, replies: [] };
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

/** The threads of one step (`stepId`) or of the route itself (`null`), oldest first. */
export function threadsOf(
	comments: readonly CommentAnswer[],
	stepId: string | null
): CommentThread[] {
	return commentThreads(comments).filter((thread) => thread.root.stepId === stepId);
}

/** Threads on steps the route no longer has (deleted since): shown, not lost. */
export function threadsOnGoneSteps(
	comments: readonly CommentAnswer[],
	stepIds: ReadonlySet<string>
): CommentThread[] {
	return commentThreads(comments).filter(
		(thread) => thread.root.stepId !== null && !stepIds.has(thread.root.stepId)
	);
}

/**
 * The open comments of a thread: those not resolved, in a thread whose first comment is not
 * resolved (resolving the first comment closes the conversation; its replies fold away with it).
 * The route page's edge counts and the project's route table both count by this one rule.
 */
export function openComments<C extends Threaded>(thread: CommentThread<C>): C[] {
	return thread.root.resolved
		? []
		: [thread.root, ...thread.replies].filter((comment) => !comment.resolved);
}

/** Open comments per step id, e.g. a thread on s1 with one open reply → { s1: 2 }. */
export function openCountsByStep(comments: readonly Threaded[]): Map<string, number> {
	const counts = new Map<string, number>();
	for (const thread of commentThreads(comments)) {
		const stepId = thread.root.stepId;
		const open = openComments(thread).length;
		if (stepId !== null && open > 0) {
			counts.set(stepId, (counts.get(stepId) ?? 0) + open);
		}
	}
	return counts;
}

/** Open comments anywhere on the route (its steps, steps since deleted and the route's own). */
export function openCommentTotal(comments: readonly Threaded[]): number {
	return commentThreads(comments).reduce((sum, thread) => sum + openComments(thread).length, 0);
}

/** "1 open comment", "3 open comments". */
export const openCommentsLabel = (count: number) =>
	`${count} open comment${count === 1 ? '' : 's'}`;
