import { error, type RequestEvent } from '@sveltejs/kit';
import { can } from '../../policy';
import type { TeamOfUser } from '../../types';
import { requireUser } from './guards';
import { teamsOfCaller } from './memberships';

/**
 * The teams the caller leads (the role that manages the team); 403 when they lead none. Used by
 * what only leads read across their teams, such as the outbox.
 */
export async function requireLedTeams(
	event: Pick<RequestEvent, 'locals' | 'url'>,
	what: string
): Promise<TeamOfUser[]> {
	const user = requireUser(event);
	const led = (await teamsOfCaller(event, user.id)).filter((team) => can(team.role, 'team.manage'));
	if (led.length === 0) {
		error(403, { code: 'forbidden', message: `Only a team lead can read ${what}.` });
	}
	return led;
}
