import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { TeamRulesAnswer } from '$lib/api/answers';
import { apiHandler, readJson } from '$lib/server/api';
import { requireTeamAction } from '$lib/server/auth/guards';
import { addOverride, listOverrides, parseOverrideBody } from '$lib/server/services/team-rules';

/** `GET /api/teams/{teamId}/rules` → `{ overrides }`, for every role of the team. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { teamId } = event.params;
	await requireTeamAction(event, teamId, 'project.read');
	return json({ overrides: await listOverrides(teamId) } satisfies TeamRulesAnswer);
});

/**
 * `POST /api/teams/{teamId}/rules` → 201 `{ id }`, leads only. A subject, class, rating or reagent
 * the rule table does not have → 422 naming the field; the same cell again → 409.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { teamId } = event.params;
	const { user } = await requireTeamAction(event, teamId, 'rules.override');
	const body = parseOverrideBody(await readJson(event, z.unknown()));
	return json(await addOverride(user, teamId, body), { status: 201 });
});
