// The library table's columns, in one place; custom cells are small components beside this file.

import {
	columnFilteringFeature,
	createFilteredRowModel,
	createSortedRowModel,
	filterFn_equalsString,
	filterFn_includesString,
	globalFilteringFeature,
	renderComponent,
	rowSortingFeature,
	sortFn_alphanumeric,
	sortFn_basic,
	tableFeatures,
	type ColumnDef
} from '@tanstack/svelte-table';
import type { SavedConditionAnswer } from '$lib/api/answers';
import { SAVED_CONDITION_KIND_LABELS } from '$lib/library/contract';
import EntryActionsCell from './EntryActionsCell.svelte';
import EntryStatusCell from './EntryStatusCell.svelte';
import PgCell from './PgCell.svelte';
import ReagentsCell from './ReagentsCell.svelte';

/** An entry with the protecting group's name from the rule table beside its id. */
export type LibraryRow = SavedConditionAnswer & { pgLabel: string };

/** What the signed-in person may do to rows, decided once by the page from their role. */
export type RowPermissions = {
	userId: string;
	canApprove: boolean;
	canAdd: boolean;
	onedit: (entry: LibraryRow) => void;
};

/** The approval filter's values: the `approved` column reads 'yes' or 'no'. */
export const APPROVAL_FILTERS = [
	{ value: '', label: 'All' },
	{ value: 'yes', label: 'Approved' },
	{ value: 'no', label: 'Not approved yet' }
];

export const libraryTableFeatures = tableFeatures({
	rowSortingFeature,
	columnFilteringFeature,
	globalFilteringFeature,
	sortedRowModel: createSortedRowModel(),
	filteredRowModel: createFilteredRowModel(),
	sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
	filterFns: { equalsString: filterFn_equalsString, includesString: filterFn_includesString }
});

type Column = ColumnDef<typeof libraryTableFeatures, LibraryRow>;
type OptionalText = 'solvent' | 'temperature' | 'time' | 'scale' | 'reference';

/** A free-text column: searched, sorted as text, a dash when blank. */
const textColumn = (key: OptionalText | 'reagents', header: string): Column => ({
	id: key,
	accessorFn: (row) => row[key] ?? '',
	header,
	sortFn: 'alphanumeric',
	cell: ({ row }) => row.original[key] || '—'
});

export function libraryColumns(permissions: RowPermissions): Column[] {
	return [
		{
			id: 'protectingGroup',
			// The id and the name, so the search box finds "silyl" as well as "TBS".
			accessorFn: (row) => `${row.protectingGroup} ${row.pgLabel}`,
			header: 'Protecting group',
			sortFn: 'alphanumeric',
			filterFn: (row, _id, value) => row.original.protectingGroup === value,
			cell: ({ row }) => renderComponent(PgCell, { entry: row.original })
		},
		{
			accessorKey: 'kind',
			header: 'Kind',
			filterFn: 'equalsString',
			enableGlobalFilter: false,
			cell: ({ row }) => SAVED_CONDITION_KIND_LABELS[row.original.kind]
		},
		{
			...textColumn('reagents', 'Reagents'),
			cell: ({ row }) => renderComponent(ReagentsCell, { entry: row.original })
		},
		textColumn('solvent', 'Solvent'),
		textColumn('temperature', 'Temperature'),
		textColumn('time', 'Time'),
		textColumn('scale', 'Scale'),
		{
			id: 'yield',
			// Blank yields sort below every number.
			accessorFn: (row) => row.yield ?? -1,
			header: 'Yield',
			sortFn: 'basic',
			enableGlobalFilter: false,
			cell: ({ row }) => (row.original.yield === null ? '—' : `${row.original.yield} %`)
		},
		textColumn('reference', 'Reference'),
		{
			id: 'author',
			accessorFn: (row) => row.author?.name ?? '',
			header: 'Author',
			sortFn: 'alphanumeric',
			cell: ({ row }) => row.original.author?.name ?? 'former member'
		},
		{
			id: 'approved',
			accessorFn: (row) => (row.approved ? 'yes' : 'no'),
			header: 'Approved',
			filterFn: 'equalsString',
			enableGlobalFilter: false,
			cell: ({ row }) => renderComponent(EntryStatusCell, { entry: row.original })
		},
		{ accessorKey: 'uses', header: 'Uses', sortFn: 'basic', enableGlobalFilter: false },
		{
			id: 'actions',
			header: 'Actions',
			enableSorting: false,
			enableGlobalFilter: false,
			cell: ({ row }) => renderComponent(EntryActionsCell, { entry: row.original, permissions })
		}
	];
}
