import { redirect } from '@sveltejs/kit';
import type { PageServerLoad } from './$types';
import { paths } from '$lib/paths';
import { requireUser } from '$lib/server/auth/guards';

export const load: PageServerLoad = (event) => {
	requireUser(event);
	redirect(303, paths.projects());
};
