import { redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { paths } from '$lib/paths';
import { signOut } from '$lib/server/auth/auth';

export const load: PageServerLoad = () => redirect(303, paths.projects());

// The sign-out form posts `redirectTo`; Auth.js clears the session cookie and redirects there.
export const actions: Actions = { default: signOut };
