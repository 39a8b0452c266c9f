import { fireEvent, render, screen, waitFor, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import type { ReviewHistoryEntry } from '$lib/api/answers';
import OpenCommentCount from '$lib/components/review/OpenCommentCount.svelte';
import ReviewHistory from '$lib/components/review/ReviewHistory.svelte';
import { comment, fakeReviewApi, makeReview, people, renderWithReview } from './review-fixture';

const entry = (over: Partial<ReviewHistoryEntry>): ReviewHistoryEntry => ({
	id: crypto.randomUUID(),
	action: 'request',
	actor: people.bo,
	reviewers: [],
	note: null,
	version: 3,
	createdAt: '2026-12-02T10:00:00Z',
	...over
});

describe('ReviewHistory', () => {
	it('tells who asked whom, who asked for changes (with the note), approvals and returns to draft', () => {
		render(ReviewHistory, {
			history: [
				entry({ action: 'request', reviewers: [people.ines], version: 3 }),
				entry({
					action: 'request-changes',
					actor: people.ines,
					note: 'Use TBDPS here.',
					version: 3
				}),
				entry({ action: 'approve', actor: people.ines, version: 5 }),
				entry({ action: 'returned-to-draft', actor: null, version: 6 })
			]
		});
		expect(screen.getByText('Review history (4 entries)')).toBeTruthy();
		const lines = within(screen.getByRole('list', { name: 'Review history' }))
			.getAllByRole('listitem')
			.map((item) => item.textContent?.replace(/\s+/g, ' ').trim());
		expect(lines).toEqual([
			'Bo Lind asked Ines Ferro to review version 3. 2 Dec 2026, 10:00 UTC',
			'Ines Ferro asked for changes to version 3. “Use TBDPS here.” 2 Dec 2026, 10:00 UTC',
			'Ines Ferro approved version 5. 2 Dec 2026, 10:00 UTC',
			'A former member edited the approved route; it went back to draft (version 6). 2 Dec 2026, 10:00 UTC'
		]);
	});

	it('says so when there is no history', () => {
		render(ReviewHistory, { history: [] });
		expect(screen.getByText('No one has asked for a review of this route yet.')).toBeTruthy();
	});
});

describe('OpenCommentCount on a step edge', () => {
	it('counts the step’s open comments, named in words, and opens the step when pressed', async () => {
		const done = comment({ resolved: true });
		const open = comment();
		const api = fakeReviewApi([
			open,
			comment({ replyTo: open.id, author: people.bo }),
			done,
			comment({ replyTo: done.id }), // in a resolved thread: folded away, not open
			comment({ stepId: 's2' })
		]);
		const { review } = makeReview(api);
		let selected = 0;
		renderWithReview(review, OpenCommentCount, { stepId: 's1', onselect: () => selected++ });
		await fireEvent.click(screen.getByRole('button', { name: '2 open comments' }));
		expect(selected).toBe(1);
		expect(screen.getByRole('button').textContent).toMatch(/2$/);
	});

	it('shows nothing for a step without open comments, and follows a resolve', async () => {
		const only = comment({ stepId: 's3' });
		const api = fakeReviewApi([only, comment({ stepId: 's3', resolved: true })]);
		const { review } = makeReview(api);
		renderWithReview(review, OpenCommentCount, { stepId: 's3', onselect: () => {} });
		expect(screen.getByRole('button', { name: '1 open comment' })).toBeTruthy();
		await review.setResolved(only.id, true);
		await waitFor(() => expect(screen.queryByRole('button')).toBeNull());
	});
});
