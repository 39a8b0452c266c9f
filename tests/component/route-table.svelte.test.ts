import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import RouteTable from '../../src/routes/projects/[projectId=uuid]/RouteTable.svelte';
import type { RouteRow } from '../../src/routes/projects/[projectId=uuid]/route-columns';
import { ROUTE_STATUS_LABELS } from '$lib/review/contract';

// The project's route table: review status in the contract's words, open comments sortable.

const row = (name: string, status: string, openComments: number, day: number): RouteRow => ({
	id: crypto.randomUUID(),
	name,
	status,
	version: 1,
	updatedAt: new Date(Date.UTC(2026, 11, day)),
	archived: false,
	openComments
});
const routes = [
	row('Quiet', 'approved', 0, 3),
	row('Busy', 'changes-requested', 7, 1),
	row('Some', 'in-review', 2, 2)
];
const cellsOf = (column: number) =>
	screen
		.getAllByTestId('route-row')
		.map((tr) => within(tr).getAllByRole('cell')[column]!.textContent?.trim());

describe('RouteTable', () => {
	it("shows each route's status in the contract's words and its open comments", () => {
		render(RouteTable, { routes, canEdit: false });
		// Newest first, as before.
		expect(cellsOf(0)).toEqual(['Quiet', 'Some', 'Busy']);
		expect(cellsOf(1)).toEqual(
			(['approved', 'in-review', 'changes-requested'] as const).map((s) => ROUTE_STATUS_LABELS[s])
		);
		expect(cellsOf(3)).toEqual(['0', '2', '7']);
	});

	it('sorts by open comments when its header is pressed', async () => {
		render(RouteTable, { routes, canEdit: false });
		const header = screen.getByRole('button', { name: /Open comments/ });
		await fireEvent.click(header);
		const first = cellsOf(3);
		await fireEvent.click(header);
		const second = cellsOf(3);
		expect([first, second]).toContainEqual(['7', '2', '0']);
		expect([first, second]).toContainEqual(['0', '2', '7']);
		// Whole rows move, not just the numbers.
		expect(cellsOf(0)).toEqual(
			second[0] === '7' ? ['Busy', 'Some', 'Quiet'] : ['Quiet', 'Some', 'Busy']
		);
		// The header says the order it shows to assistive technology, as the arrow does on screen.
		const th = header.closest('th')!;
		expect(th.getAttribute('aria-sort')).toBe(second[0] === '7' ? 'descending' : 'ascending');
		expect(header.textContent).toContain(second[0] === '7' ? '▼' : '▲');
	});

	it("offers the contract's statuses in the filter", () => {
		render(RouteTable, { routes, canEdit: false });
		const options = within(screen.getByLabelText('Status')).getAllByRole('option');
		expect(options.map((o) => o.textContent)).toEqual([
			'All',
			...Object.values(ROUTE_STATUS_LABELS)
		]);
	});
});
