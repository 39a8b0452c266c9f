// The team's condition library as the route map holds it: the entries the page load read, and
// saving a step's conditions as a new entry, after which the list is read again (so the new
// entry and every entry's uses are the server's, never counted here).

import type { ApiResult } from '$lib/client/api';
import type { RouteClient } from '$lib/client/route-client';
import type { CreatedSavedConditionAnswer, SavedConditionAnswer } from '$lib/api/answers';
import type { NewSavedConditionRequest } from '$lib/library/contract';

export class TeamLibrary {
	entries = $state<SavedConditionAnswer[]>([]);

	constructor(
		readonly teamId: string,
		entries: SavedConditionAnswer[],
		private readonly client: Pick<RouteClient, 'library' | 'saveCondition'>
	) {
		this.entries = entries;
	}

	/** `POST /api/library` for this team; a refusal comes back for the form to show. */
	create(
		fields: Omit<NewSavedConditionRequest, 'teamId'>
	): Promise<ApiResult<CreatedSavedConditionAnswer>> {
		return this.client.saveCondition({ ...fields, teamId: this.teamId });
	}

	/** Reads the entries again; on failure (toasted by the client) the old list stays. */
	async reload() {
		const entries = await this.client.library(this.teamId);
		if (entries) {
			this.entries = entries;
		}
	}
}
