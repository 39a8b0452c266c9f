import { fireEvent, screen, waitFor, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import SidePanel from '$lib/components/route-map/SidePanel.svelte';
import StepPanel from '$lib/components/route-map/StepPanel.svelte';
import type { Analysis } from '$lib/client/route-client';
import type { RouteDocument } from '$lib/route/document';
import { libraryEntry, LIBRARY_TEAM } from '../factories/library-entries';
import { makeEditor, renderWithEditor } from './route-editor-fixture';

// The step panel's suggestions from the team's condition library (issue 16).

const diol = 'OCCCCO';
const silylEther = 'CC(C)(C)[Si](C)(C)OCCCCO';
const protection: RouteDocument = {
	name: 'OG-2040',
	intermediates: [
		{ id: 'a', label: 'diol', structure: diol, position: { x: 0, y: 0 } },
		{ id: 'b', label: 'mono-TBS ether', structure: silylEther, position: { x: 320, y: 0 } }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'TBSCl' }]
};
// Just the perceived groups: the suggestions read nothing else of an analysis.
const analysis = (pgs: string[]) =>
	({
		groups: [],
		protectingGroups: pgs.map((id) => ({ id, atoms: [], masks: 'alcohol' }))
	}) as unknown as Analysis;
const analyses = { [diol]: analysis([]), [silylEther]: analysis(['TBS']) };

const best = libraryEntry({
	reagents: 'TBSOTf, 2,6-lutidine',
	solvent: 'CH2Cl2',
	temperature: '−78 °C',
	yield: 94,
	reference: 'OG notebook 12/44',
	approved: true,
	uses: 1
});
const conditions = [
	libraryEntry({ reagents: 'TBSCl, imidazole', uses: 9 }),
	best,
	libraryEntry({ reagents: 'TBSCl, Et3N', approved: true, uses: 4 }),
	libraryEntry({ reagents: 'TBSCl, old way', approved: true, uses: 20, retired: true }),
	libraryEntry({ reagents: 'TBAF', kind: 'remove', approved: true }),
	libraryEntry({ reagents: 'BnBr, NaH', protectingGroup: 'Bn', approved: true })
];
const step = () => protection.steps[0]!;
const offered = () =>
	screen.queryAllByTestId('suggestion').map((li) => li.querySelector('p')?.textContent);

describe('StepPanel: saved conditions for a protection step', () => {
	it('offers the TBS installs, approved first, then by uses, never retired ones', async () => {
		const { editor } = await makeEditor({ document: protection, analyses, library: conditions });
		renderWithEditor(editor, StepPanel, { step: step() });
		expect(offered()).toEqual([
			'TBSCl, Et3N, DMF, rt',
			'TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C',
			'TBSCl, imidazole, DMF, rt'
		]);
		const second = within(screen.getAllByTestId('suggestion')[1]!);
		expect(second.getByText(/94 % yield · OG notebook 12\/44 · used in 1\s+step/)).toBeTruthy();
	});

	it('"Use this" writes the reagents and links the step to the entry, undoably', async () => {
		const { editor } = await makeEditor({ document: protection, analyses, library: conditions });
		renderWithEditor(editor, StepPanel, { step: step() });
		await fireEvent.click(screen.getByRole('button', { name: 'Use this: TBSOTf, 2,6-lutidine' }));
		expect(editor.doc.steps[0]).toMatchObject({
			reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C',
			savedCondition: best.id
		});
		expect(editor.saveState).toBe('pending');
		editor.undo();
		expect(editor.doc.steps[0]?.reagents).toBe('TBSCl');
		expect(editor.doc.steps[0]?.savedCondition).toBeUndefined();
	});

	it('marks the entry a step already follows instead of offering it again', async () => {
		const linked = { ...protection, steps: [{ ...step(), savedCondition: best.id }] };
		const { editor } = await makeEditor({ document: linked, analyses, library: conditions });
		renderWithEditor(editor, StepPanel, { step: linked.steps[0]! });
		const item = within(screen.getAllByTestId('suggestion')[1]!);
		expect(item.getByText('Used in this step')).toBeTruthy();
		expect(item.queryByRole('button', { name: /Use this/ })).toBeNull();
	});

	it('a reader sees the suggestions without "Use this"', async () => {
		const { editor } = await makeEditor({
			document: protection,
			analyses,
			library: conditions,
			canEdit: false
		});
		renderWithEditor(editor, StepPanel, { step: step() });
		expect(offered()).toHaveLength(3);
		expect(screen.queryByRole('button', { name: /Use this/ })).toBeNull();
	});

	it('before the structures are read, a deprotection step gets the removal entries', async () => {
		const deprotect = { ...protection, steps: [{ ...step(), intent: 'deprotect' as const }] };
		const { editor } = await makeEditor({ document: deprotect, library: conditions });
		renderWithEditor(editor, StepPanel, { step: deprotect.steps[0]! });
		expect(offered()).toEqual(['TBAF, DMF, rt']);
	});

	it('a transformation that keeps its groups gets no library section', async () => {
		const same = { [diol]: analysis(['TBS']), [silylEther]: analysis(['TBS']) };
		const { editor } = await makeEditor({
			document: protection,
			analyses: same,
			library: conditions
		});
		renderWithEditor(editor, StepPanel, { step: step() });
		expect(screen.queryByText('From the team’s condition library')).toBeNull();
	});
});

describe('SidePanel: saving a step’s conditions to the library', () => {
	const open = async (options: Parameters<typeof makeEditor>[0]) => {
		const made = await makeEditor({ document: protection, analyses, library: [], ...options });
		made.editor.select({ kind: 'step', id: 's1' });
		renderWithEditor(made.editor, SidePanel, {});
		return made;
	};

	it('saves the step’s reagents as a TBS install (read from the structures) and links the step', async () => {
		const { editor, client } = await open({});
		await fireEvent.click(
			screen.getByRole('button', { name: 'Save this step’s conditions to the library' })
		);
		const form = within(
			screen.getByRole('form', { name: 'Save this step’s conditions to the library' })
		);
		// The diol → mono-TBS ether step puts a TBS on: both are chosen already.
		expect((form.getByLabelText('Protecting group') as HTMLSelectElement).value).toBe('TBS');
		expect((form.getByLabelText('Kind') as HTMLSelectElement).value).toBe('install');
		await fireEvent.input(form.getByLabelText('Yield (%)'), { target: { value: '94' } });
		await fireEvent.input(form.getByLabelText('Reference (DOI or notebook page)'), {
			target: { value: 'OG notebook 12/44' }
		});
		await fireEvent.submit(form.getByRole('button', { name: 'Save' }).closest('form')!);
		await waitFor(() =>
			expect(screen.getByText(/Saved to the team’s library and linked to this step/)).toBeTruthy()
		);
		expect(client.saveCondition).toHaveBeenCalledWith({
			teamId: LIBRARY_TEAM,
			protectingGroup: 'TBS',
			kind: 'install',
			reagents: 'TBSCl',
			yield: 94,
			reference: 'OG notebook 12/44'
		});
		const [entry] = editor.library!;
		expect(editor.doc.steps[0]!.savedCondition).toBe(entry!.id);
		// Saved before the library was read again, so the server's uses can count the step.
		expect(client.save).toHaveBeenCalled();
		const item = within(screen.getByTestId('suggestion'));
		expect(item.getByText('Used in this step')).toBeTruthy();
		expect(screen.getByText(/A lead approves it on the library page/).getAttribute('role')).toBe(
			'status'
		);
	});

	it('moves the choice to the group the structures show when their analyses arrive after the form opened', async () => {
		const late: Record<string, (a: Analysis) => void> = {};
		// Marked a protection, so the panel offers the library before the structures are read.
		const marked = { ...protection, steps: [{ ...step(), intent: 'protect' as const }] };
		const { editor, client } = await makeEditor({ document: marked, library: [] });
		client.analyze.mockImplementation(
			(structure: string) =>
				new Promise((resolve) => {
					late[structure] = (a) => resolve({ ok: true, status: 200, data: a });
				})
		);
		editor.select({ kind: 'step', id: 's1' });
		renderWithEditor(editor, SidePanel, {});
		await fireEvent.click(
			screen.getByRole('button', { name: 'Save this step’s conditions to the library' })
		);
		const pg = () => (screen.getByLabelText('Protecting group') as HTMLSelectElement).value;
		expect(pg()).not.toBe('TBS');
		late[diol]!(analysis([]));
		late[silylEther]!(analysis(['TBS']));
		await waitFor(() => expect(pg()).toBe('TBS'));
		expect((screen.getByLabelText('Kind') as HTMLSelectElement).value).toBe('install');
	});

	it('shows a refusal where the chemist saved, and leaves the step as it was', async () => {
		const { editor, client } = await open({});
		client.saveCondition.mockResolvedValueOnce({
			ok: false,
			status: 403,
			code: 'forbidden',
			message: 'Your role cannot add to the library.'
		} as never);
		await fireEvent.click(
			screen.getByRole('button', { name: 'Save this step’s conditions to the library' })
		);
		await fireEvent.submit(screen.getByRole('button', { name: 'Save' }).closest('form')!);
		await waitFor(() =>
			expect(screen.getByRole('alert').textContent).toBe(
				'Not saved: Your role cannot add to the library.'
			)
		);
		expect(editor.doc.steps[0]!.savedCondition).toBeUndefined();
	});

	it('is not offered to a reader, nor for a step that already follows an entry', async () => {
		await open({ canEdit: false, canSaveConditions: false });
		expect(screen.queryByRole('button', { name: /Save this step’s conditions/ })).toBeNull();
		document.body.innerHTML = '';
		const linked = { ...protection, steps: [{ ...step(), savedCondition: best.id }] };
		await open({ document: linked, library: conditions });
		expect(screen.queryByRole('button', { name: /Save this step’s conditions/ })).toBeNull();
	});
});
