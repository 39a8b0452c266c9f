// The route page's review state in the browser: the comments (posted, edited, resolved through
// ReviewClient, which toasts what fails) and the review actions (whose refusals come back as
// plain sentences for the review bar). Status and history are page data: after an action the
// page is reloaded (`reload`, invalidateAll on the page) rather than patched here by guesswork.

import type { CommentAnswer } from '$lib/api/answers';
import { VERSION_CONFLICT } from '$lib/api/errors';
import type { ApiFailure } from '$lib/client/api';
import type { ReviewClient } from '$lib/client/review-client';
import type { Toasts } from '$lib/client/toasts.svelte';
import { ROUTE_STATUS_LABELS, type ReviewAction, type ReviewBody } from '$lib/review/contract';
import {
	openCountsByStep,
	threadsOf,
	threadsOnGoneSteps,
	type CommentThread
} from '$lib/review/threads';

export type ReviewInit = {
	routeId: string;
	comments: CommentAnswer[];
	/** The signed-in person: only the author may edit a comment. */
	userId: string;
	canComment: boolean;
};

export type ActOutcome = { ok: true } | { ok: false; message: string };

/** A refused review action in words the person can act on. */
export function reviewFailureText(failure: ApiFailure): string {
	if (failure.code === VERSION_CONFLICT) {
		const now = (failure.details as { currentVersion?: number } | undefined)?.currentVersion;
		return `The route changed while you were reading it${now ? ` (it is now version ${now})` : ''}. Reload the page and review what is there now.`;
	}
	return failure.message;
}

export class ReviewState {
	readonly routeId: string;
	readonly userId: string;
	readonly canComment: boolean;
	#comments = $state.raw<CommentAnswer[]>([]);
	#openCounts = $derived(openCountsByStep(this.#comments));

	constructor(
		init: ReviewInit,
		private readonly client: ReviewClient,
		private readonly toasts: Toasts,
		private readonly reload: () => Promise<void>
	) {
		this.routeId = init.routeId;
		this.userId = init.userId;
		this.canComment = init.canComment;
		this.#comments = init.comments;
	}

	get comments(): readonly CommentAnswer[] {
		return this.#comments;
	}

	/** The threads of a step, or of the route itself (`null`). */
	threads(stepId: string | null): CommentThread[] {
		return threadsOf(this.#comments, stepId);
	}

	/** Threads on steps no longer among `stepIds` (the route's steps now). */
	threadsOnGoneSteps(stepIds: ReadonlySet<string>): CommentThread[] {
		return threadsOnGoneSteps(this.#comments, stepIds);
	}

	/** Open comments on a step (0 when none). */
	openCount(stepId: string): number {
		return this.#openCounts.get(stepId) ?? 0;
	}

	isMine(comment: CommentAnswer): boolean {
		return comment.author?.id === this.userId;
	}

	/** Reads the comments again; keeps the ones shown when that fails (the client toasts). */
	async refresh(): Promise<boolean> {
		const comments = await this.client.comments(this.routeId);
		if (comments) {
			this.#comments = comments;
		}
		return comments !== null;
	}

	/** A new comment on a step or the route, or a reply; false (text kept) when refused. */
	async post(body: string, place: { stepId?: string; replyTo?: string } = {}): Promise<boolean> {
		const result = await this.client.post(this.routeId, { body, ...place });
		if (!result.ok) {
			return false;
		}
		// The new comment's author, time and rendered HTML are the server's: read them back.
		await this.refresh();
		return true;
	}

	async edit(commentId: string, body: string): Promise<boolean> {
		const result = await this.client.update(commentId, { body });
		if (result.ok) {
			this.#replace(result.data);
		}
		return result.ok;
	}

	async setResolved(commentId: string, resolved: boolean): Promise<boolean> {
		const result = await this.client.update(commentId, { resolved });
		if (result.ok) {
			this.#replace(result.data);
		}
		return result.ok;
	}

	/** A review action; on success the page (status, version, history) is loaded again. */
	async act(action: ReviewAction, extras: Omit<ReviewBody, 'action'> = {}): Promise<ActOutcome> {
		const result = await this.client.review(this.routeId, { action, ...extras });
		if (!result.ok) {
			return { ok: false, message: reviewFailureText(result) };
		}
		this.toasts.show(`The route is now “${ROUTE_STATUS_LABELS[result.data.status]}”.`, 'success');
		await this.reload();
		return { ok: true };
	}

	#replace(updated: CommentAnswer) {
		this.#comments = this.#comments.map((comment) =>
			comment.id === updated.id ? updated : comment
		);
	}
}
