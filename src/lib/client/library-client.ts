// Browser calls for the condition library that are not page forms: the CSV import (a file
// upload the API reads as multipart). Failures come back as values for the page to show in
// place; a bad CSV is a list of rows to fix, not a toast.

import { paths } from '$lib/paths';
import { callApi } from './api';

/** One refused CSV row, as the import answers it (row numbers count the header as row 1). */
export type ImportProblem = { row: number | null; column: string | null; reason: string };

export type ImportOutcome =
	{ ok: true; imported: number | null } | { ok: false; message: string; problems: ImportProblem[] };

/** Sends the file; nothing is stored unless every row is good (the API's rule). */
export async function importLibraryCsv(
	teamId: string,
	file: File,
	fetcher: typeof fetch = fetch
): Promise<ImportOutcome> {
	const form = new FormData();
	form.set('teamId', teamId);
	form.set('file', file);
	const result = await callApi<unknown>(
		paths.libraryImport(),
		{ method: 'POST', body: form },
		fetcher
	);
	if (result.ok) {
		return { ok: true, imported: countOf(result.data) };
	}
	return { ok: false, message: result.message, problems: problemsOf(result.details) };
}

/** `{ imported: 3 }`, `{ ids: [...] }` or `{ conditions: [...] }` → 3; null when it says none. */
function countOf(answer: unknown): number | null {
	const body = (answer ?? {}) as { imported?: unknown; ids?: unknown; conditions?: unknown };
	if (typeof body.imported === 'number') {
		return body.imported;
	}
	const list = Array.isArray(body.ids) ? body.ids : body.conditions;
	return Array.isArray(list) ? list.length : null;
}

/** The rows a refusal lists, in `details` itself or under `details.rows` / `details.problems`. */
export function problemsOf(details: unknown): ImportProblem[] {
	const holder = (details ?? {}) as { rows?: unknown; problems?: unknown };
	const list = Array.isArray(details) ? details : (holder.rows ?? holder.problems);
	if (!Array.isArray(list)) {
		return [];
	}
	return list.map((item) => {
		const { row, column, reason, message } = (item ?? {}) as Record<string, unknown>;
		return {
			row: typeof row === 'number' ? row : null,
			column: typeof column === 'string' ? column : null,
			reason: typeof reason === 'string' ? reason : typeof message === 'string' ? message : ''
		};
	});
}
