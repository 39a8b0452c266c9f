import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { SavedConditionAnswer } from '$lib/api/answers';
import { savedConditionPatch } from '$lib/library/contract';
import { apiHandler, readJson } from '$lib/server/api';
import { requireSavedConditionAction } from '$lib/server/auth/guards';
import { parseFields } from '$lib/server/fields';
import { savedConditionAnswerOf } from '$lib/server/services/library';
import { deleteSavedCondition, updateSavedCondition } from '$lib/server/services/library-writes';

/**
 * `PATCH /api/library/{id}` (any written field, `retired`) → the entry as it now stands; its
 * author or a lead, others 403; a bad field → 422 naming it.
 */
export const PATCH: RequestHandler = apiHandler(async (event) => {
	const { user, role, entry } = await requireSavedConditionAction(
		event,
		event.params.conditionId,
		'library.add'
	);
	const patch = parseFields(savedConditionPatch, await readJson(event, z.unknown()));
	await updateSavedCondition(user, role, entry, patch);
	return json((await savedConditionAnswerOf(entry.id)) satisfies SavedConditionAnswer);
});

/** `DELETE /api/library/{id}` → 204 (its author or a lead); an entry steps follow → 409. */
export const DELETE: RequestHandler = apiHandler(async (event) => {
	const { user, role, entry } = await requireSavedConditionAction(
		event,
		event.params.conditionId,
		'library.add'
	);
	await deleteSavedCondition(user, role, entry);
	return new Response(null, { status: 204 });
});
