import { redirect } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';
import { paths } from '$lib/paths';
import { signOut } from '$lib/server/auth/auth';

export const load: PageServerLoad = () => redirect(303, paths.projects());

// Auth.js reads a form body; a sign-out needs nothing from the client's body, so whatever form it
// sent (hooks/form-bodies.ts has already refused bodies that are not forms) Auth.js gets a
// well-formed one. Its `signOut` event ends the
// session on the server (auth/sessions.ts), then it clears the cookie and goes to sign-in.
export const actions: Actions = {
	default: (event) => {
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		headers.delete('content-length');
		const body = new URLSearchParams({ redirectTo: paths.signIn() });
		return signOut({
			...event,
			request: new Request(event.request.url, { method: 'POST', headers, body })
		});
	}
};
