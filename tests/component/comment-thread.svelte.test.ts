import { fireEvent, screen, waitFor, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import CommentsSection from '$lib/components/review/CommentsSection.svelte';
import { comment, fakeReviewApi, makeReview, people, renderWithReview } from './review-fixture';

const show = (api: ReturnType<typeof fakeReviewApi>, options = {}) => {
	const made = makeReview(api, options);
	renderWithReview(made.review, CommentsSection, {
		stepId: 's1',
		heading: 'Comments on this step'
	});
	return made;
};
const openList = () => screen.getByRole('list', { name: 'Open comments' });

describe('CommentThread: what a step’s comments show', () => {
	it('renders the server’s HTML, marks an edited comment, and keeps other steps’ comments out', () => {
		const api = fakeReviewApi([
			comment({
				body: 'Why **NaH** here?',
				html: '<p>Why <strong>NaH</strong> here?</p>',
				editedAt: '2026-12-01T10:00:00Z'
			}),
			comment({ stepId: 's2', html: '<p>About another step</p>' }),
			comment({ stepId: null, html: '<p>About the whole route</p>' })
		]);
		show(api);
		const item = within(openList()).getByRole('article', { name: 'Comment by Ines Ferro' });
		expect(within(item).getByText('NaH').tagName).toBe('STRONG');
		expect(within(item).getByText('edited')).toBeTruthy();
		expect(screen.queryByText('About another step')).toBeNull();
		expect(screen.queryByText('About the whole route')).toBeNull();
	});

	it('posts a reply to the thread’s first comment and shows it nested under it, one level deep', async () => {
		const root = comment({ html: '<p>Is the TBS ether safe here?</p>' });
		const earlier = comment({ replyTo: root.id, author: people.bo, html: '<p>I think so.</p>' });
		const api = fakeReviewApi([root, earlier]);
		show(api);
		// Replying is offered on the thread's first comment; answers to answers stay one level in.
		await fireEvent.click(within(openList()).getByRole('button', { name: 'Reply' }));
		await fireEvent.input(screen.getByLabelText('Your reply'), {
			target: { value: 'Yes: TBAF comes two steps later.' }
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Post reply' }));
		await waitFor(() => expect(screen.getByText('Yes: TBAF comes two steps later.')).toBeTruthy());
		expect(api.sent.find((r) => r.method === 'POST')?.body).toEqual({
			body: 'Yes: TBAF comes two steps later.',
			replyTo: root.id,
			stepId: 's1'
		});
		const replies = within(openList()).getByRole('list', { name: 'Replies' });
		expect(
			within(replies)
				.getAllByRole('article')
				.map((a) => a.textContent)
		).toEqual([
			expect.stringContaining('I think so.'),
			expect.stringContaining('Yes: TBAF comes two steps later.')
		]);
		expect(screen.queryByLabelText('Your reply')).toBeNull(); // the form closes once posted
	});

	it('folds resolved threads under "N resolved", and Resolve moves an open one there', async () => {
		const done = comment({ html: '<p>Old question</p>', resolved: true });
		const doneReply = comment({ replyTo: done.id, html: '<p>Old answer</p>' });
		const open = comment({ html: '<p>New question</p>' });
		const api = fakeReviewApi([done, doneReply, open]);
		show(api);
		expect(within(openList()).queryByText('Old question')).toBeNull();
		const folded = screen.getByText('1 resolved').closest('details')!;
		expect(folded.open).toBe(false);
		expect(within(folded).getByText('Old question')).toBeTruthy();
		expect(within(folded).getByText('Old answer')).toBeTruthy();

		await fireEvent.click(within(openList()).getByRole('button', { name: 'Resolve' }));
		await waitFor(() => expect(screen.getByText('2 resolved')).toBeTruthy());
		expect(api.sent.at(-1)).toEqual({
			method: 'PATCH',
			url: `/api/comments/${open.id}`,
			body: { resolved: true }
		});
		expect(screen.queryByRole('list', { name: 'Open comments' })).toBeNull();
		expect(screen.getByText('No open comments.')).toBeTruthy();
		// Reopening brings it back.
		const reopen = within(screen.getByText('2 resolved').closest('details')!).getAllByRole(
			'button',
			{ name: 'Reopen' }
		);
		await fireEvent.click(reopen[1]!);
		await waitFor(() => expect(within(openList()).getByText('New question')).toBeTruthy());
	});

	it('offers Edit on one’s own comments only, and shows the edit as edited', async () => {
		const mine = comment({ author: people.bo, html: '<p>Mine</p>' });
		const theirs = comment({ html: '<p>Theirs</p>' });
		const api = fakeReviewApi([mine, theirs]);
		show(api, { userId: people.bo.id });
		const [mineItem, theirItem] = within(openList()).getAllByRole('article');
		expect(within(theirItem!).queryByRole('button', { name: 'Edit' })).toBeNull();
		await fireEvent.click(within(mineItem!).getByRole('button', { name: 'Edit' }));
		const field = screen.getByLabelText<HTMLTextAreaElement>('Your comment');
		expect(field.value).toBe(mine.body);
		await fireEvent.input(field, { target: { value: 'Mine, better' } });
		await fireEvent.click(screen.getByRole('button', { name: 'Save' }));
		await waitFor(() => expect(screen.getByText('Mine, better')).toBeTruthy());
		expect(api.sent.at(-1)?.body).toEqual({ body: 'Mine, better' });
		const edited = within(openList()).getByRole('article', { name: 'Comment by Bo Lind' });
		expect(within(edited).getByText('edited')).toBeTruthy();
	});

	it('posts a new comment on the step, and refuses a blank one without sending it', async () => {
		const api = fakeReviewApi([]);
		show(api);
		expect(screen.getByText('No comments yet.')).toBeTruthy();
		const post = screen.getByRole('button', { name: 'Post comment' });
		await fireEvent.input(screen.getByLabelText('Comment on this step'), {
			target: { value: '   ' }
		});
		await fireEvent.click(post);
		expect(screen.getByText('Write something first.')).toBeTruthy();
		expect(api.sent).toEqual([]);
		await fireEvent.input(screen.getByLabelText('Comment on this step'), {
			target: { value: 'Check the **workup**' }
		});
		await fireEvent.click(post);
		await waitFor(() => expect(within(openList()).getByText('Check the **workup**')).toBeTruthy());
		expect(api.sent[0]).toEqual({
			method: 'POST',
			url: '/api/routes/r/comments',
			body: { body: 'Check the **workup**', stepId: 's1' }
		});
		expect(screen.getByLabelText<HTMLTextAreaElement>('Comment on this step').value).toBe('');
	});

	it('keeps the text when the server refuses a comment, and says why in a toast', async () => {
		const api = fakeReviewApi([]);
		api.fetcher.mockResolvedValueOnce(
			new Response(JSON.stringify({ error: { code: 'forbidden', message: 'Not allowed.' } }), {
				status: 403
			})
		);
		const { toasts } = show(api);
		await fireEvent.input(screen.getByLabelText('Comment on this step'), {
			target: { value: 'Keep me' }
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Post comment' }));
		await waitFor(() =>
			expect(toasts.items.map((t) => t.message)).toEqual([
				'The comment was not posted: Not allowed.'
			])
		);
		expect(screen.getByLabelText<HTMLTextAreaElement>('Comment on this step').value).toBe(
			'Keep me'
		);
	});

	it('gives a viewer the comments to read, no form and no buttons, and a sentence saying why', () => {
		const root = comment({ html: '<p>Read me</p>' });
		const api = fakeReviewApi([root, comment({ replyTo: root.id, html: '<p>And me</p>' })]);
		show(api, { canComment: false });
		expect(screen.getByText('Read me')).toBeTruthy();
		expect(screen.getByText('And me')).toBeTruthy();
		expect(screen.queryByRole('textbox')).toBeNull();
		expect(screen.queryAllByRole('button')).toEqual([]);
		expect(screen.getByText(/as a viewer you cannot write them/)).toBeTruthy();
	});

	it('keeps comments on a step deleted since in sight, under the route’s, without a reply form', () => {
		const api = fakeReviewApi([
			comment({ stepId: 's9', html: '<p>About a deleted step</p>' }),
			comment({ stepId: null, html: '<p>About the route</p>' })
		]);
		const { review } = makeReview(api);
		renderWithReview(review, CommentsSection, {
			stepId: null,
			heading: 'Comments on the route',
			stepIds: new Set(['s1'])
		});
		expect(screen.getByRole('heading', { name: 'On steps no longer in the route' })).toBeTruthy();
		const gone = screen.getByText('About a deleted step').closest('article')!;
		expect(within(gone).queryByRole('button', { name: 'Reply' })).toBeNull();
		expect(within(gone).getByRole('button', { name: 'Resolve' })).toBeTruthy();
		const route = screen.getByText('About the route').closest('article')!;
		expect(within(route).getByRole('button', { name: 'Reply' })).toBeTruthy();
	});
});
