import type { LayoutServerLoad } from './$types';
import { teamsOf } from '$lib/server/services/teams';

export const load: LayoutServerLoad = async ({ locals }) => {
	const user = locals.user;
	return { user, teams: user ? await teamsOf(user.id) : [] };
};
