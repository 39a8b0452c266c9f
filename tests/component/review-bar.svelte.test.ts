import { fireEvent, screen, waitFor, within } from '@testing-library/svelte';
import { beforeAll, describe, expect, it } from 'vitest';
import type { ReviewHistoryEntry } from '$lib/api/answers';
import ReviewBar from '$lib/components/review/ReviewBar.svelte';
import type { Role } from '$lib/policy';
import type { RouteStatus } from '$lib/review/contract';
import {
	fakeReviewApi,
	makeReview,
	people,
	polyfillDialog,
	renderWithReview
} from './review-fixture';

beforeAll(polyfillDialog);

const reviewers = [
	{ ...people.bo, email: 'bo@example.org' },
	{ ...people.ines, email: 'ines@example.org' }
];
const ACTION_BUTTONS = ['Ask for review', 'Approve', 'Ask for changes', 'Withdraw request'];

function show(
	role: Role,
	status: RouteStatus,
	over: { approvedVersion?: number | null; history?: ReviewHistoryEntry[]; version?: number } = {}
) {
	const api = fakeReviewApi([]);
	const made = makeReview(api);
	renderWithReview(made.review, ReviewBar, {
		status,
		version: over.version ?? 7,
		approvedVersion: over.approvedVersion ?? null,
		history: over.history ?? [],
		reviewers,
		role
	});
	return { api, ...made };
}
const bar = () => screen.getByRole('region', { name: 'Review' });
const buttons = () =>
	within(bar())
		.queryAllByRole('button')
		.map((b) => b.textContent?.trim());

describe('ReviewBar: the actions each role has in each status', () => {
	// Role × status → buttons, as the contract's transitions and the policy's grants allow.
	const EXPECTED: Record<Role, Record<RouteStatus, string[]>> = {
		lead: {
			draft: ['Ask for review'],
			'in-review': ['Approve', 'Ask for changes', 'Withdraw request'],
			'changes-requested': ['Ask for review', 'Withdraw request'],
			approved: []
		},
		chemist: {
			draft: ['Ask for review'],
			'in-review': ['Withdraw request'],
			'changes-requested': ['Ask for review', 'Withdraw request'],
			approved: []
		},
		reviewer: {
			draft: [],
			'in-review': ['Approve', 'Ask for changes'],
			'changes-requested': [],
			approved: []
		},
		viewer: { draft: [], 'in-review': [], 'changes-requested': [], approved: [] }
	};
	for (const [role, byStatus] of Object.entries(EXPECTED)) {
		for (const [status, expected] of Object.entries(byStatus)) {
			it(`${role}, ${status}: ${expected.join(', ') || 'no actions'}`, () => {
				show(role as Role, status as RouteStatus);
				expect(buttons()).toEqual(expected);
				expect(ACTION_BUTTONS).toEqual(expect.arrayContaining(expected));
			});
		}
	}

	it('names the status in words, not by colour alone', () => {
		show('viewer', 'changes-requested');
		expect(within(bar()).getByText('Status: Changes requested')).toBeTruthy();
	});
});

describe('ReviewBar: what each action sends', () => {
	it('Approve sends the version on the page, then reloads the page', async () => {
		const { api, reload } = show('reviewer', 'in-review', { version: 7 });
		api.answerReviewWith({ status: 200, body: { status: 'approved', version: 7 } });
		await fireEvent.click(screen.getByRole('button', { name: 'Approve' }));
		await waitFor(() => expect(reload).toHaveBeenCalledOnce());
		expect(api.sent).toEqual([
			{ method: 'POST', url: '/api/routes/r/review', body: { action: 'approve', version: 7 } }
		]);
	});

	it('Ask for review sends the ticked reviewers’ e-mails and the note, and needs at least one', async () => {
		const { api, reload } = show('chemist', 'draft');
		await fireEvent.click(screen.getByRole('button', { name: 'Ask for review' }));
		const dialog = screen.getByRole('dialog', { name: 'Ask for review' });
		await fireEvent.click(within(dialog).getByRole('button', { name: 'Send request' }));
		expect(within(dialog).getByText('Choose at least one reviewer.')).toBeTruthy();
		expect(api.sent).toEqual([]);
		await fireEvent.click(within(dialog).getByLabelText('Ines Ferro'));
		await fireEvent.input(within(dialog).getByLabelText('Note (optional)'), {
			target: { value: ' Step 3 first, please. ' }
		});
		await fireEvent.click(within(dialog).getByRole('button', { name: 'Send request' }));
		await waitFor(() => expect(reload).toHaveBeenCalledOnce());
		expect(api.sent[0]?.body).toEqual({
			action: 'request',
			reviewers: ['ines@example.org'],
			note: 'Step 3 first, please.'
		});
		expect(screen.queryByRole('dialog')).toBeNull();
	});

	it('marks the caller among the reviewers who may be asked', async () => {
		show('lead', 'draft'); // makeReview's caller is Bo
		await fireEvent.click(screen.getByRole('button', { name: 'Ask for review' }));
		expect(screen.getByLabelText('Bo Lind (you)')).toBeTruthy();
	});

	it('Ask for changes demands a note before it sends anything', async () => {
		const { api, reload } = show('reviewer', 'in-review');
		await fireEvent.click(screen.getByRole('button', { name: 'Ask for changes' }));
		const dialog = screen.getByRole('dialog', { name: 'Ask for changes' });
		const send = within(dialog).getByRole('button', { name: 'Ask for changes' });
		await fireEvent.input(within(dialog).getByLabelText('What should change?'), {
			target: { value: '   ' }
		});
		await fireEvent.click(send);
		expect(
			within(dialog).getByText('Say what should change, so the author knows what to do.')
		).toBeTruthy();
		expect(api.sent).toEqual([]);
		await fireEvent.input(within(dialog).getByLabelText('What should change?'), {
			target: { value: 'Use TBDPS: TBS will not survive step 4.' }
		});
		await fireEvent.click(send);
		await waitFor(() => expect(reload).toHaveBeenCalledOnce());
		expect(api.sent[0]?.body).toEqual({
			action: 'request-changes',
			note: 'Use TBDPS: TBS will not survive step 4.'
		});
	});

	it('Withdraw request sends the action alone', async () => {
		const { api, reload } = show('chemist', 'in-review');
		await fireEvent.click(screen.getByRole('button', { name: 'Withdraw request' }));
		await waitFor(() => expect(reload).toHaveBeenCalledOnce());
		expect(api.sent[0]?.body).toEqual({ action: 'withdraw' });
	});
});

describe('ReviewBar: refusals in plain words', () => {
	it('shows the server’s reason for a refused transition and does not reload', async () => {
		const { api, reload } = show('lead', 'in-review');
		api.answerReviewWith({
			status: 409,
			body: {
				error: {
					code: 'invalid_transition',
					message: 'This route is already approved; edit it to start a new review.'
				}
			}
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Approve' }));
		await waitFor(() =>
			expect(within(bar()).getByRole('alert').textContent).toBe(
				'This route is already approved; edit it to start a new review.'
			)
		);
		expect(reload).not.toHaveBeenCalled();
	});

	it('explains a version conflict on approval: the route changed while it was being read', async () => {
		const { api } = show('reviewer', 'in-review', { version: 7 });
		api.answerReviewWith({
			status: 409,
			body: {
				error: {
					code: 'version_conflict',
					message: 'Conflict.',
					details: { currentVersion: 8 }
				}
			}
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Approve' }));
		await waitFor(() =>
			expect(within(bar()).getByRole('alert').textContent).toBe(
				'The route changed while you were reading it (it is now version 8). Reload the page and review what is there now.'
			)
		);
	});

	it('shows a refused request inside its dialog, keeping what was chosen', async () => {
		const { api } = show('chemist', 'draft');
		api.answerReviewWith({
			status: 422,
			body: { error: { code: 'invalid_body', message: 'Bo Lind may not review: viewer.' } }
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Ask for review' }));
		const dialog = screen.getByRole('dialog', { name: 'Ask for review' });
		await fireEvent.click(within(dialog).getByLabelText('Bo Lind (you)'));
		await fireEvent.click(within(dialog).getByRole('button', { name: 'Send request' }));
		await waitFor(() =>
			expect(within(dialog).getByRole('alert').textContent).toBe('Bo Lind may not review: viewer.')
		);
		expect(within(dialog).getByLabelText<HTMLInputElement>('Bo Lind (you)').checked).toBe(true);
	});
});

describe('ReviewBar: the approval', () => {
	const approval = (version: number): ReviewHistoryEntry => ({
		id: `e${version}`,
		action: 'approve',
		actor: people.ines,
		reviewers: [],
		note: null,
		version,
		createdAt: '2026-12-02T10:00:00Z'
	});

	it('says which version was approved and by whom', () => {
		show('viewer', 'approved', { version: 4, approvedVersion: 4, history: [approval(4)] });
		expect(screen.getByTestId('approval').textContent).toBe('Approved at version 4 by Ines Ferro');
	});

	it('says the route has changed since its approval and is back in draft', () => {
		show('viewer', 'draft', { version: 6, approvedVersion: 4, history: [approval(4)] });
		expect(screen.getByTestId('approval').textContent).toBe(
			'Version 4 was approved; the route has changed since (now version 6) and is back in draft'
		);
	});

	it('says nothing of approval for a route never approved', () => {
		show('viewer', 'draft');
		expect(screen.queryByTestId('approval')).toBeNull();
	});
});
