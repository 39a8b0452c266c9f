import type { RequestEvent } from '@sveltejs/kit';
import type { Role } from '../../policy';
import { teamsOf, type TeamOfUser } from '../services/teams';

// The caller's teams and roles, read from the database at most once per request, whoever asks
// (the root layout, a page's guard, the projects page). The memo lives on `event.locals`, which
// SvelteKit creates afresh for every request, so nothing outlives the request: a role changed by
// another instance on the same database applies from the next request on. The promise is kept,
// not the rows, because the layout and the page load run side by side and must share one query.
// It is made on first use rather than in a hook so every path that reaches a guard (hooks, form
// actions, endpoints, tests that build an event by hand) gets it without a setup step to forget.

type MembershipEvent = Pick<RequestEvent, 'locals'>;

/** The teams `userId` belongs to, with their role in each: one query per request. */
export function teamsOfCaller(event: MembershipEvent, userId: string): Promise<TeamOfUser[]> {
	const memo = event.locals.memberships;
	if (memo?.userId === userId) {
		return memo.teams;
	}
	const teams = teamsOf(userId);
	event.locals.memberships = { userId, teams };
	return teams;
}

/** The caller's role in one team, or null when they are not a member. */
export async function callerRoleIn(
	event: MembershipEvent,
	userId: string,
	teamId: string
): Promise<Role | null> {
	const teams = await teamsOfCaller(event, userId);
	return teams.find((team) => team.id === teamId)?.role ?? null;
}

/**
 * Drops the memo after this request changed memberships (a team action), so the page rendered
 * after the action shows the new roles rather than the ones read before the change.
 */
export function forgetCallerMemberships(event: MembershipEvent): void {
	event.locals.memberships = undefined;
}
