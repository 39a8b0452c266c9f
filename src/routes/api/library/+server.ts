import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { CreatedSavedConditionAnswer, LibraryAnswer } from '$lib/api/answers';
import { libraryQuery, newSavedConditionBody } from '$lib/library/contract';
import { apiHandler, readJson } from '$lib/server/api';
import { requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { teamsOfCaller } from '$lib/server/auth/memberships';
import { parseFields } from '$lib/server/fields';
import { listSavedConditions } from '$lib/server/services/library';
import { createSavedCondition } from '$lib/server/services/library-writes';

/**
 * `GET /api/library?teamId&protectingGroup&kind&q&approved` → `{ conditions }`: the entries of the
 * caller's teams (or of the one team named; another team's id → 404), retired ones included.
 */
export const GET: RequestHandler = apiHandler(async (event) => {
	const user = requireUser(event);
	const query = parseFields(libraryQuery, Object.fromEntries(event.url.searchParams));
	const { teamId, ...filters } = query;
	if (teamId) {
		await requireTeamAction(event, teamId, 'project.read');
	}
	const teamIds = teamId ? [teamId] : (await teamsOfCaller(event, user.id)).map((team) => team.id);
	const conditions = await listSavedConditions(teamIds, filters);
	return json({ conditions } satisfies LibraryAnswer);
});

/**
 * `POST /api/library` `{ teamId, protectingGroup, kind, reagents, … }` → 201 `{ id }` (lead,
 * chemist). The team is checked before the fields, so another team's id is a 404 whatever the
 * body; an unknown PG id, kind or a yield outside 0–100 → 422 naming the field.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const raw = await readJson(event, z.unknown());
	const { teamId } = parseFields(z.object({ teamId: z.uuid() }), raw);
	const { user } = await requireTeamAction(event, teamId, 'library.add');
	const body = parseFields(newSavedConditionBody, raw);
	const entry = await createSavedCondition(user, body);
	return json({ id: entry.id } satisfies CreatedSavedConditionAnswer, { status: 201 });
});
