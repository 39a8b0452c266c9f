import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { SavedConditionAnswer } from '$lib/api/answers';
import { apiHandler } from '$lib/server/api';
import { requireSavedConditionAction } from '$lib/server/auth/guards';
import { savedConditionAnswerOf } from '$lib/server/services/library';
import { approveSavedCondition } from '$lib/server/services/library-writes';

/** `POST /api/library/{id}/approve` → the approved entry (leads only; others 403). */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { user, entry } = await requireSavedConditionAction(
		event,
		event.params.conditionId,
		'library.approve'
	);
	await approveSavedCondition(user, entry);
	return json((await savedConditionAnswerOf(entry.id)) satisfies SavedConditionAnswer);
});
