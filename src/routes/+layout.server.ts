import type { LayoutServerLoad } from './$types';
import { teamsOfCaller } from '$lib/server/auth/memberships';

// The teams come from the request's membership memo, so the page's guard (run alongside this
// load) reuses the same query instead of reading the memberships a second time.
export const load: LayoutServerLoad = async (event) => {
	const user = event.locals.user;
	return { user, teams: user ? await teamsOfCaller(event, user.id) : [] };
};
