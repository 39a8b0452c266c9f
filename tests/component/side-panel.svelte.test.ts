import { fireEvent, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { describe, expect, it } from 'vitest';
import SidePanel from '$lib/components/route-map/SidePanel.svelte';
import type { RouteEditor } from '$lib/components/route-map/route-editor.svelte';
import { makeEditor, renderWithEditor } from './route-editor-fixture';

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
