import { fireEvent, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { describe, expect, it } from 'vitest';
import StepPanel from '$lib/components/route-map/StepPanel.svelte';
import type { RouteEditor } from '$lib/components/route-map/route-editor.svelte';
import { makeEditor, routeDoc, stepCheck, renderWithEditor } from './route-editor-fixture';

const step = routeDoc.steps[0]!;
const show = (editor: RouteEditor) => renderWithEditor(editor, StepPanel, { step });
const text = () => document.body.textContent ?? '';

describe('StepPanel: what the check says about a step', () => {
	it('a step the server could not check reads "Not checked", never "No clashes found"', async () => {
		const { editor } = await makeEditor({
			checks: [
				stepCheck({ error: { code: 'invalid_structure', message: 'The product cannot be read.' } })
			]
		});
		show(editor);
		expect(screen.getByText('Not checked: The product cannot be read.')).toBeTruthy();
		expect(text()).not.toMatch(/No clashes found/);
	});

	it('lists the clashes of a step that has them', async () => {
		const { editor } = await makeEditor({
			checks: [
				stepCheck({
					clashes: [
						{
							severity: 'clash',
							kind: 'attacks-free-group',
							subject: 'ketone',
							condition: 'organometallic',
							atoms: [1],
							message: 'MeMgBr adds to the free ketone.'
						}
					]
				})
			]
		});
		show(editor);
		expect(screen.getByRole('list', { name: 'Clashes' }).textContent).toContain(
			'MeMgBr adds to the free ketone.'
		);
		expect(text()).not.toMatch(/No clashes found/);
	});

	it('says "No clashes found" only for a step checked clean', async () => {
		const { editor } = await makeEditor({ checks: [stepCheck()] });
		show(editor);
		expect(screen.getByText('No clashes found for these conditions.')).toBeTruthy();
	});

	it('limits "No clashes found" to the reagents it knew, and names the others', async () => {
		const { editor } = await makeEditor({ checks: [stepCheck({ unrecognized: ['Grubbs II'] })] });
		show(editor);
		expect(screen.getByText('No clashes found for the reagents Orthogon recognised.')).toBeTruthy();
		expect(screen.getByText('Not recognised: Grubbs II — its effect is not checked.')).toBeTruthy();
	});

	it('claims nothing before a check answer has arrived', async () => {
		const { editor } = await makeEditor();
		show(editor);
		expect(text()).not.toMatch(/No clashes found|Not checked/);
	});

	it('shows reagent hazards and the safety reminder for a step with reagents', async () => {
		const { editor } = await makeEditor({
			checks: [stepCheck({ hazards: [{ reagent: 'MeMgBr', note: 'reacts violently with water' }] })]
		});
		show(editor);
		expect(screen.getByRole('list', { name: 'Reagent hazards' }).textContent).toMatch(
			/MeMgBr:\s*reacts violently with water/
		);
		expect(text()).toContain('Check the safety data sheet (SDS)');
	});
});

describe('StepPanel: editing', () => {
	it('typing reagents changes the step in the document', async () => {
		const { editor } = await makeEditor();
		show(editor);
		await fireEvent.input(screen.getByLabelText('Reagents and conditions'), {
			target: { value: 'TBSCl, imidazole' }
		});
		expect(editor.doc.steps[0]?.reagents).toBe('TBSCl, imidazole');
		expect(editor.saveState).toBe('pending');
	});

	it('"Delete step" removes the step and with it the selection', async () => {
		const { editor } = await makeEditor();
		editor.select({ kind: 'step', id: 's1' });
		show(editor);
		await fireEvent.click(screen.getByRole('button', { name: 'Delete step' }));
		flushSync();
		expect(editor.doc.steps).toEqual([]);
		expect(editor.selection).toBeNull();
	});

	it('a viewer reads the step without fields or a delete button', async () => {
		const { editor } = await makeEditor({ canEdit: false });
		show(editor);
		expect(screen.queryAllByRole('textbox')).toHaveLength(0);
		expect(screen.queryByRole('button', { name: 'Delete step' })).toBeNull();
		expect(screen.getByText('MeMgBr, THF')).toBeTruthy();
	});
});
