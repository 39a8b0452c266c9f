// A ReviewState whose browser client talks to a fake of the review API (issue 15's contract) kept
// in memory: the comments it holds, every request it was sent, and the answer a review action
// gets. Components render under it with WithReview (or renderWithEditor's `review`).

import { render } from '@testing-library/svelte';
import type { Component } from 'svelte';
import { vi } from 'vitest';
import type { CommentAnswer, ReviewAnswer } from '$lib/api/answers';
import type { ApiErrorBody } from '$lib/api/errors';
import { ReviewClient } from '$lib/client/review-client';
import { Toasts } from '$lib/client/toasts.svelte';
import { ReviewState } from '$lib/components/review/review-state.svelte';
import WithReview from './WithReview.svelte';

export const people = {
	ines: { id: 'u-ines', name: 'Ines Ferro' },
	bo: { id: 'u-bo', name: 'Bo Lind' }
};

let clock = Date.parse('2026-12-01T09:00:00Z');
/** A comment as the API answers it, by Ines on step s1 unless `over` says otherwise. */
export function comment(over: Partial<CommentAnswer> = {}): CommentAnswer {
	clock += 60_000;
	return {
		id: crypto.randomUUID(),
		stepId: 's1',
		replyTo: null,
		author: people.ines,
		body: 'A question',
		html: '<p>A question</p>',
		resolved: false,
		createdAt: new Date(clock).toISOString(),
		editedAt: null,
		...over
	};
}

export type SentRequest = { method: string; url: string; body: unknown };
type Answer = { status: number; body: ReviewAnswer | ApiErrorBody };

/** An in-memory comments API; `reviewAnswer` is what `POST …/review` gets. */
export function fakeReviewApi(initial: CommentAnswer[], author = people.bo) {
	const comments = [...initial];
	const sent: SentRequest[] = [];
	let reviewAnswer: Answer = { status: 200, body: { status: 'in-review', version: 3 } };
	const json = (status: number, body: unknown) =>
		new Response(JSON.stringify(body), {
			status,
			headers: { 'content-type': 'application/json' }
		});
	const fetcher = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
		const url = String(input);
		const method = init.method ?? 'GET';
		const body: unknown = init.body ? JSON.parse(String(init.body)) : undefined;
		sent.push({ method, url, body });
		if (url.endsWith('/review')) {
			return json(reviewAnswer.status, reviewAnswer.body);
		}
		if (url.endsWith('/comments') && method === 'GET') {
			return json(200, { comments });
		}
		if (url.endsWith('/comments') && method === 'POST') {
			const posted = body as { body: string; stepId?: string; replyTo?: string };
			const created = comment({
				author,
				body: posted.body,
				html: `<p>${posted.body}</p>`,
				stepId: posted.stepId ?? null,
				replyTo: posted.replyTo ?? null
			});
			comments.push(created);
			return json(201, { id: created.id });
		}
		const patched = comments.findIndex((c) => url.endsWith(`/api/comments/${c.id}`));
		if (method === 'PATCH' && patched >= 0) {
			const patch = body as { body?: string; resolved?: boolean };
			const old = comments[patched]!;
			comments[patched] = {
				...old,
				...(patch.body !== undefined
					? { body: patch.body, html: `<p>${patch.body}</p>`, editedAt: new Date().toISOString() }
					: {}),
				...(patch.resolved !== undefined ? { resolved: patch.resolved } : {})
			};
			return json(200, comments[patched]);
		}
		return json(404, { error: { code: 'not_found', message: 'Nothing here.' } });
	});
	return {
		fetcher,
		sent,
		comments,
		answerReviewWith(answer: Answer) {
			reviewAnswer = answer;
		}
	};
}

/** The review state of route `r` as `person` sees it, talking to `api`. */
export function makeReview(
	api: ReturnType<typeof fakeReviewApi>,
	{ userId = people.bo.id, canComment = true } = {}
) {
	const toasts = new Toasts();
	const reload = vi.fn(async () => {});
	const review = new ReviewState(
		{ routeId: 'r', comments: [...api.comments], userId, canComment },
		new ReviewClient(toasts, api.fetcher as unknown as typeof fetch),
		toasts,
		reload
	);
	return { review, reload, toasts };
}

/** Renders `component` with `props` under `review` in context. */
export function renderWithReview<Props extends Record<string, unknown>>(
	review: ReviewState,
	component: Component<Props>,
	props: Props
) {
	return render(WithReview, {
		props: {
			review,
			component: component as unknown as Component<Record<string, unknown>>,
			props
		}
	});
}

// jsdom has <dialog> but not showModal() or close(); the Dialog primitive calls both.
export function polyfillDialog() {
	const proto = HTMLDialogElement.prototype;
	proto.showModal ??= function (this: HTMLDialogElement) {
		this.open = true;
	};
	proto.close ??= function (this: HTMLDialogElement) {
		this.open = false;
		this.dispatchEvent(new Event('close'));
	};
}
