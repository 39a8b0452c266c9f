// Browser calls for review on the route page (issue 15's contract): comments and review actions.
// Comment failures are toasted here, once; a review action's failure is returned for the review
// bar to show in place, where the person who pressed the button is looking.

import type {
	CommentAnswer,
	CommentsAnswer,
	CreatedCommentAnswer,
	ReviewAnswer,
	UpdatedCommentAnswer
} from '$lib/api/answers';
import { paths } from '$lib/paths';
import type { CommentPatchBody, NewCommentBody, ReviewBody } from '$lib/review/contract';
import { callApi, jsonBody, type ApiResult } from './api';
import type { Toasts } from './toasts.svelte';

export class ReviewClient {
	constructor(
		private readonly toasts: Toasts,
		private readonly fetcher: typeof fetch = fetch
	) {}

	/** Every comment on the route, oldest first; null (and a toast) when they could not be read. */
	async comments(routeId: string): Promise<CommentAnswer[] | null> {
		const result = await this.#call<CommentsAnswer>(
			paths.routeComments(routeId),
			{},
			'The comments could not be loaded'
		);
		return result.ok ? result.data.comments : null;
	}

	post(routeId: string, body: NewCommentBody): Promise<ApiResult<CreatedCommentAnswer>> {
		return this.#call<CreatedCommentAnswer>(
			paths.routeComments(routeId),
			jsonBody('POST', body),
			'The comment was not posted'
		);
	}

	update(commentId: string, patch: CommentPatchBody): Promise<ApiResult<UpdatedCommentAnswer>> {
		const failure =
			patch.body !== undefined
				? 'The comment was not changed'
				: patch.resolved
					? 'The comment was not resolved'
					: 'The comment was not reopened';
		return this.#call<UpdatedCommentAnswer>(
			paths.comment(commentId),
			jsonBody('PATCH', patch),
			failure
		);
	}

	/** Not toasted: the review bar shows the refusal (a 409, 403 or 422) beside its buttons. */
	review(routeId: string, body: ReviewBody): Promise<ApiResult<ReviewAnswer>> {
		return callApi<ReviewAnswer>(paths.routeReview(routeId), jsonBody('POST', body), this.fetcher);
	}

	async #call<T>(url: string, init: RequestInit, failure: string): Promise<ApiResult<T>> {
		const result = await callApi<T>(url, init, this.fetcher);
		if (!result.ok) {
			this.toasts.show(`${failure}: ${result.message}`, 'problem');
		}
		return result;
	}
}
