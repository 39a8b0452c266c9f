// Browser calls for the condition library that are not page forms: the CSV import (a file
// upload the API reads as multipart). Failures come back as values for the page to show in
// place; a bad CSV is a list of rows to fix, not a toast.

import type { LibraryImportAnswer } from '$lib/api/answers';
import type { ImportRowProblem } from '$lib/library/contract';
import { paths } from '$lib/paths';
import { callApi } from './api';

export type ImportOutcome =
	| { ok: true; counts: LibraryImportAnswer }
	| { ok: false; message: string; problems: ImportRowProblem[] };

/** Sends the file; nothing is stored unless every row is good (the API's rule). */
export async function importLibraryCsv(
	teamId: string,
	file: File,
	fetcher: typeof fetch = fetch
): Promise<ImportOutcome> {
	const form = new FormData();
	form.set('teamId', teamId);
	form.set('file', file);
	const result = await callApi<LibraryImportAnswer>(
		paths.libraryImport(),
		{ method: 'POST', body: form },
		fetcher
	);
	if (result.ok) {
		return { ok: true, counts: result.data };
	}
	// A 422 `invalid_rows` lists every problem under `details.rows`; other refusals list none.
	const rows = (result.details as { rows?: unknown } | undefined)?.rows;
	return {
		ok: false,
		message: result.message,
		problems: Array.isArray(rows) ? (rows as ImportRowProblem[]) : []
	};
}

/** E.g. `{ created: 2, updated: 1, unchanged: 0 }` → '2 added, 1 changed, 0 unchanged'. */
export const importSummary = ({ created, updated, unchanged }: LibraryImportAnswer) =>
	`${created} added, ${updated} changed, ${unchanged} unchanged`;
