import { fireEvent, screen, waitFor } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { describe, expect, it } from 'vitest';
import SidePanel from '$lib/components/route-map/SidePanel.svelte';
import type { RouteEditor } from '$lib/components/route-map/route-editor.svelte';
import { makeEditor, renderWithEditor, stepCheck } from './route-editor-fixture';
import { comment, fakeReviewApi, makeReview } from './review-fixture';

const show = (editor: RouteEditor) => renderWithEditor(editor, SidePanel, {});
const heading = () => screen.getAllByRole('heading', { level: 2 })[0]?.textContent;

describe('SidePanel follows the editor’s one selection', () => {
	it('shows the selected step, then the selected intermediate, then the route', async () => {
		const { editor } = await makeEditor();
		show(editor);
		expect(heading()).toBe('This route');
		editor.select({ kind: 'step', id: 's1' });
		flushSync();
		expect(heading()).toMatch(/^Step: keto ester → hydroxy ketone/);
		editor.select({ kind: 'intermediate', id: 'b' });
		flushSync();
		expect(heading()).toBe('Intermediate: hydroxy ketone');
		await fireEvent.click(screen.getByRole('button', { name: 'Back to the route' }));
		expect(editor.selection).toBeNull();
		expect(heading()).toBe('This route');
	});

	it('falls back to the route when the selected item is deleted, so nothing stale stays selected', async () => {
		const { editor } = await makeEditor();
		editor.select({ kind: 'intermediate', id: 'a' });
		show(editor);
		expect(heading()).toBe('Intermediate: keto ester');
		editor.remove(['a']);
		flushSync();
		expect(editor.selection).toBeNull();
		expect(heading()).toBe('This route');
	});
});

describe('SidePanel when the clash check could not run', () => {
	it('says no step is checked, on the route and on a step, instead of the earlier verdicts', async () => {
		const { editor, client } = await makeEditor({ checks: [stepCheck()] });
		editor.select({ kind: 'step', id: 's1' });
		show(editor);
		expect(screen.getByText('No clashes found for these conditions.')).toBeTruthy();
		client.check.mockResolvedValueOnce({
			ok: false,
			status: 503,
			code: 'chemistry_busy',
			message: 'The chemistry service is busy; try again in a moment.'
		} as never);
		await editor.check.refresh();
		flushSync();
		expect(screen.queryByText('No clashes found for these conditions.')).toBeNull();
		expect(screen.getByRole('alert').textContent).toMatch(
			/^\s*Not checked: the clash check could not run, so no step of this route has a verdict\.\s+The chemistry service is busy/
		);
		editor.select(null);
		flushSync();
		expect(screen.getByRole('alert').textContent).toContain('Not checked');
	});
});

describe('SidePanel: the route name', () => {
	it('refuses a blank name with a message, keeps the stored one, and follows an undo', async () => {
		const { editor } = await makeEditor();
		show(editor);
		const field = screen.getByLabelText<HTMLInputElement>('Route name');
		expect(field.value).toBe('OG-2031');
		await fireEvent.input(field, { target: { value: '  ' } });
		expect(screen.getByText('A route needs a name.')).toBeTruthy();
		expect(editor.doc.name).toBe('OG-2031');
		await fireEvent.input(field, { target: { value: 'OG-2032' } });
		expect(editor.doc.name).toBe('OG-2032');
		editor.undo();
		flushSync();
		expect(field.value).toBe('OG-2031');
	});
});

describe('SidePanel: the comment threads (issue 15)', () => {
	it('shows the route’s thread, then the selected step’s, and lets a reviewer comment on a read-only map', async () => {
		const api = fakeReviewApi([
			comment({ stepId: null, html: '<p>On the whole route</p>' }),
			comment({ stepId: 's1', html: '<p>On the Grignard step</p>' })
		]);
		const { review } = makeReview(api); // a reviewer: may comment
		const { editor } = await makeEditor({ canEdit: false });
		renderWithEditor(editor, SidePanel, {}, review);
		expect(screen.getByRole('heading', { name: 'Comments on the route' })).toBeTruthy();
		expect(screen.getByText('On the whole route')).toBeTruthy();
		expect(screen.queryByText('On the Grignard step')).toBeNull();

		editor.select({ kind: 'step', id: 's1' });
		flushSync();
		expect(screen.getByRole('heading', { name: 'Comments on this step' })).toBeTruthy();
		expect(screen.getByText('On the Grignard step')).toBeTruthy();
		expect(screen.queryByText('On the whole route')).toBeNull();
		await fireEvent.input(screen.getByLabelText('Comment on this step'), {
			target: { value: 'Dry THF?' }
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Post comment' }));
		await waitFor(() => expect(screen.getByText('Dry THF?')).toBeTruthy());
		expect(api.sent[0]?.body).toEqual({ body: 'Dry THF?', stepId: 's1' });
	});
});
