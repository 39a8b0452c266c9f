import { fireEvent, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import ConditionChips from '$lib/components/route-map/ConditionChips.svelte';
import type { RouteEditor } from '$lib/components/route-map/route-editor.svelte';
import type { RouteStep } from '$lib/route/document';
import type { ConditionLabel } from '$lib/client/route-client';
import { makeEditor, routeDoc, renderWithEditor } from './route-editor-fixture';

const step: RouteStep = { ...routeDoc.steps[0]!, conditions: ['organometallic'] };
const document = { ...routeDoc, steps: [step] };
const labels: ConditionLabel[] = [
	{ id: 'organometallic', label: 'Organometallic reagents' },
	{ id: 'acid-mild', label: 'Mild acid' }
];
const show = (editor: RouteEditor, inferred: string[]) =>
	renderWithEditor(editor, ConditionChips, { step, inferred });
const chips = () =>
	within(screen.getByRole('list'))
		.getAllByRole('listitem')
		.map((li) => li.textContent?.replace(/[×\s]+/g, ' ').trim());

describe('ConditionChips', () => {
	it('shows hand-set classes by label and read ones once, marked as from the reagents', async () => {
		const { editor } = await makeEditor({ document, labels });
		show(editor, ['organometallic', 'acid-mild']);
		expect(chips()).toEqual(['Organometallic reagents', 'Mild acid (from reagents)']);
	});

	it('adds a class chosen from the list', async () => {
		const { editor } = await makeEditor({ document, labels });
		show(editor, []);
		await fireEvent.change(screen.getByLabelText('Add a condition class'), {
			target: { value: 'acid-mild' }
		});
		await fireEvent.click(screen.getByRole('button', { name: 'Add' }));
		expect(editor.doc.steps[0]?.conditions).toEqual(['organometallic', 'acid-mild']);
	});

	it('removes a hand-set class', async () => {
		const { editor } = await makeEditor({ document, labels });
		show(editor, []);
		await fireEvent.click(
			screen.getByRole('button', { name: 'Remove condition Organometallic reagents' })
		);
		expect(editor.doc.steps[0]?.conditions ?? []).toEqual([]);
	});

	it('gives a viewer no remove buttons and no add field', async () => {
		const { editor } = await makeEditor({ document, labels, canEdit: false });
		show(editor, []);
		expect(screen.queryAllByRole('button')).toHaveLength(0);
		expect(screen.queryByLabelText('Add a condition class')).toBeNull();
	});
});
