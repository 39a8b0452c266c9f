import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { describe, expect, it, vi } from 'vitest';
import LibraryTable from '../../src/routes/library/LibraryTable.svelte';
import type { LibraryRow, RowPermissions } from '../../src/routes/library/library-columns';
import { libraryEntry } from '../factories/library-entries';

// The library page's table: sorting, the three filters and the search box, and which buttons
// each person gets on a row.

const me = '00000000-0000-4000-8000-0000000000aa';
const row = (over: Parameters<typeof libraryEntry>[0]): LibraryRow => ({
	...libraryEntry(over),
	pgLabel: over?.protectingGroup === 'Bn' ? 'benzyl ether' : 'tert-butyldimethylsilyl ether'
});
const entries = [
	row({ reagents: 'TBSCl, imidazole', uses: 2, yield: 95, approved: true }),
	row({
		reagents: 'TBAF, AcOH',
		kind: 'remove',
		uses: 7,
		yield: 88,
		author: { id: me, name: 'Me' }
	}),
	row({
		reagents: 'BnBr, NaH',
		protectingGroup: 'Bn',
		uses: 0,
		yield: null,
		reference: '10.1000/xyz'
	})
];
const permissions = (over: Partial<RowPermissions> = {}): RowPermissions => ({
	userId: me,
	canAdd: true,
	canApprove: false,
	onedit: vi.fn(),
	...over
});
const reagentsShown = () =>
	screen
		.queryAllByTestId('library-row')
		.map((tr) => within(tr).getAllByRole('cell')[2]!.textContent?.trim());

describe('LibraryTable', () => {
	it('lists the most used first, and sorts by yield when its header is pressed', async () => {
		render(LibraryTable, { entries, permissions: permissions() });
		expect(reagentsShown()).toEqual(['TBAF, AcOH', 'TBSCl, imidazole', 'BnBr, NaH']);
		const header = screen.getByRole('button', { name: /Yield/ });
		await fireEvent.click(header);
		const first = reagentsShown();
		await fireEvent.click(header);
		const second = reagentsShown();
		// Blank yields sort below every number.
		expect([first, second]).toContainEqual(['TBSCl, imidazole', 'TBAF, AcOH', 'BnBr, NaH']);
		expect([first, second]).toContainEqual(['BnBr, NaH', 'TBAF, AcOH', 'TBSCl, imidazole']);
	});

	it('filters by protecting group, kind and approval', async () => {
		render(LibraryTable, { entries, permissions: permissions() });
		await fireEvent.change(screen.getByLabelText('Protecting group'), { target: { value: 'Bn' } });
		expect(reagentsShown()).toEqual(['BnBr, NaH']);
		await fireEvent.change(screen.getByLabelText('Protecting group'), { target: { value: '' } });
		await fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'remove' } });
		expect(reagentsShown()).toEqual(['TBAF, AcOH']);
		await fireEvent.change(screen.getByLabelText('Kind'), { target: { value: '' } });
		await fireEvent.change(screen.getByLabelText('Approval'), { target: { value: 'yes' } });
		expect(reagentsShown()).toEqual(['TBSCl, imidazole']);
		await fireEvent.change(screen.getByLabelText('Approval'), { target: { value: 'no' } });
		expect(reagentsShown()).toEqual(['TBAF, AcOH', 'BnBr, NaH']);
	});

	it('searches the text columns and the protecting group’s name', async () => {
		render(LibraryTable, { entries, permissions: permissions() });
		await fireEvent.input(screen.getByLabelText('Search'), { target: { value: 'acoh' } });
		expect(reagentsShown()).toEqual(['TBAF, AcOH']);
		await fireEvent.input(screen.getByLabelText('Search'), { target: { value: 'benzyl' } });
		expect(reagentsShown()).toEqual(['BnBr, NaH']);
		await fireEvent.input(screen.getByLabelText('Search'), { target: { value: '10.1000' } });
		expect(reagentsShown()).toEqual(['BnBr, NaH']);
		await fireEvent.input(screen.getByLabelText('Search'), { target: { value: 'osmium' } });
		expect(reagentsShown()).toEqual([]);
		expect(screen.getByText('No saved condition matches these filters.')).toBeTruthy();
	});

	it('a chemist edits and deletes only their own entries and never approves', () => {
		render(LibraryTable, { entries, permissions: permissions() });
		expect(screen.getAllByRole('button', { name: /^Edit the/ })).toHaveLength(1);
		expect(screen.getByRole('button', { name: /^Edit the TBS remove entry/ })).toBeTruthy();
		expect(screen.getAllByRole('button', { name: /^Delete the/ })).toHaveLength(1);
		expect(screen.queryByRole('button', { name: /^(Approve|Retire) the/ })).toBeNull();
	});

	it('a lead approves the unapproved, retires any, and edits every entry', () => {
		render(LibraryTable, { entries, permissions: permissions({ canApprove: true, userId: 'x' }) });
		expect(screen.getAllByRole('button', { name: /^Approve the/ })).toHaveLength(2);
		expect(screen.getAllByRole('button', { name: /^Retire the/ })).toHaveLength(3);
		expect(screen.getAllByRole('button', { name: /^Edit the/ })).toHaveLength(3);
	});

	it('a reviewer or viewer gets no buttons at all', () => {
		render(LibraryTable, { entries, permissions: permissions({ canAdd: false }) });
		expect(screen.queryAllByRole('button', { name: /the .* entry/ })).toHaveLength(0);
	});

	it('"Edit" hands the row to the form', async () => {
		const onedit = vi.fn();
		render(LibraryTable, { entries, permissions: permissions({ onedit }) });
		await fireEvent.click(screen.getByRole('button', { name: /^Edit the/ }));
		expect(onedit).toHaveBeenCalledWith(expect.objectContaining({ reagents: 'TBAF, AcOH' }));
	});

	it('says which reagent text Orthogon could not read, and names the hazards with the SDS', () => {
		const unread = row({
			reagents: 'OG-Cat 17, TBSCl',
			unrecognized: ['OG-Cat 17'],
			hazards: [{ reagent: 'TBSCl', note: 'Corrosive; reacts with water.' }]
		});
		render(LibraryTable, { entries: [unread], permissions: permissions() });
		expect(screen.getByTestId('entry-unrecognized').textContent).toBe(
			'Not recognised: OG-Cat 17 — its effect is not checked.'
		);
		const hazards = screen.getByText(/^Hazards: TBSCl — check the SDS\.$/);
		expect(hazards.getAttribute('title')).toBe('TBSCl: Corrosive; reacts with water.');
	});
});
