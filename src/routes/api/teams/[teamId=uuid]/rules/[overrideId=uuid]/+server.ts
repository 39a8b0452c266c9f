import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireTeamAction } from '$lib/server/auth/guards';
import { removeOverride } from '$lib/server/services/team-rules';

/** `DELETE /api/teams/{teamId}/rules/{id}` → 204, leads only; an override of another team → 404. */
export const DELETE: RequestHandler = apiHandler(async (event) => {
	const { teamId, overrideId } = event.params;
	const { user } = await requireTeamAction(event, teamId, 'rules.override');
	await removeOverride(user, teamId, overrideId);
	return new Response(null, { status: 204 });
});
