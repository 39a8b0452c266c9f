// The route list's columns, in one place; custom cells are small components beside this file.

import {
	columnFilteringFeature,
	createFilteredRowModel,
	createSortedRowModel,
	filterFn_equalsString,
	renderComponent,
	rowSortingFeature,
	sortFn_alphanumeric,
	sortFn_basic,
	sortFn_datetime,
	tableFeatures,
	type ColumnDef
} from '@tanstack/svelte-table';
import RouteActionsCell from './RouteActionsCell.svelte';
import RouteNameCell from './RouteNameCell.svelte';
import RouteStatusCell from './RouteStatusCell.svelte';

export type RouteRow = {
	id: string;
	name: string;
	status: string;
	version: number;
	updatedAt: Date;
	archived: boolean;
	/** Unresolved comments on the route and its steps. */
	openComments: number;
};

export const routeTableFeatures = tableFeatures({
	rowSortingFeature,
	columnFilteringFeature,
	sortedRowModel: createSortedRowModel(),
	filteredRowModel: createFilteredRowModel(),
	sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic, datetime: sortFn_datetime },
	filterFns: { equalsString: filterFn_equalsString }
});

export function routeColumns(canEdit: boolean): ColumnDef<typeof routeTableFeatures, RouteRow>[] {
	const columns: ColumnDef<typeof routeTableFeatures, RouteRow>[] = [
		{
			accessorKey: 'name',
			header: 'Name',
			sortFn: 'alphanumeric',
			cell: ({ row }) => renderComponent(RouteNameCell, { route: row.original })
		},
		{
			accessorKey: 'status',
			header: 'Status',
			filterFn: 'equalsString',
			cell: ({ row }) =>
				renderComponent(RouteStatusCell, {
					status: row.original.status,
					archived: row.original.archived
				})
		},
		{ accessorKey: 'version', header: 'Version' },
		{ accessorKey: 'openComments', header: 'Open comments', sortFn: 'basic' },
		{
			accessorKey: 'updatedAt',
			// Not "Last saved": the project's rename form has a "Save" button, and names are matched by substring.
			header: 'Updated',
			sortFn: 'datetime',
			cell: ({ row }) =>
				row.original.updatedAt.toLocaleString('en-GB', {
					day: 'numeric',
					month: 'short',
					hour: '2-digit',
					minute: '2-digit'
				})
		},
		{
			id: 'actions',
			header: 'Actions',
			enableSorting: false,
			cell: ({ row }) => renderComponent(RouteActionsCell, { route: row.original, canEdit })
		}
	];
	return columns;
}
