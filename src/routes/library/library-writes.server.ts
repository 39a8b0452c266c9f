// The library page's writes go through the JSON API with the request's own fetch, so the
// page and scripts share one set of rules (who may write, which fields are valid).

import { callApi, jsonBody, type ApiResult } from '$lib/client/api';
import { paths } from '$lib/paths';
import type { LibraryEntryForm } from './schema';

type Fetch = typeof fetch;

/** Creates the entry (no id) or changes it (an id); the API answers 201 `{ id }` or 200. */
export function saveEntry(fetcher: Fetch, entry: LibraryEntryForm): Promise<ApiResult<unknown>> {
	const { id, teamId, ...fields } = entry;
	return id
		? callApi(paths.savedCondition(id), jsonBody('PATCH', fields), fetcher)
		: callApi(paths.libraryApi(), jsonBody('POST', { ...fields, teamId }), fetcher);
}

export const approveEntry = (fetcher: Fetch, id: string) =>
	callApi(paths.approveSavedCondition(id), { method: 'POST' }, fetcher);

/** Retired entries stay in the library but are no longer suggested; restoring undoes it. */
export const setEntryRetired = (fetcher: Fetch, id: string, retired: boolean) =>
	callApi(paths.savedCondition(id), jsonBody('PATCH', { retired }), fetcher);

export const deleteEntry = (fetcher: Fetch, id: string) =>
	callApi(paths.savedCondition(id), { method: 'DELETE' }, fetcher);

/**
 * The form field a 422 names (`details: { field }`, as every library write answers it), or null
 * when it names none of the form's fields.
 */
export function refusedField(details: unknown, fields: readonly string[]): string | null {
	const field = (details as { field?: unknown } | undefined)?.field;
	return typeof field === 'string' && fields.includes(field) ? field : null;
}
