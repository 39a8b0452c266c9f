// The team's condition library as the pages read it: through GET /api/library with the
// request's own fetch (cookies and all), so the page and scripts see exactly what the API
// answers, and one guard decides who reads what.

import type { LibraryAnswer, SavedConditionAnswer } from '../api/answers';
import { callApi } from '../client/api';
import { paths } from '../paths';

/** The entries, or why they could not be read (shown on the page, never an empty list). */
export type TeamLibrary =
	{ conditions: SavedConditionAnswer[]; error: null } | { conditions: []; error: string };

export async function readTeamLibrary(fetcher: typeof fetch, teamId: string): Promise<TeamLibrary> {
	const query = new URLSearchParams({ teamId });
	const result = await callApi<LibraryAnswer>(`${paths.libraryApi()}?${query}`, {}, fetcher);
	if (!result.ok) {
		return {
			conditions: [],
			error: `The condition library could not be read: ${result.message}`
		};
	}
	return { conditions: result.data.conditions, error: null };
}
