import { fail, isRedirect, redirect } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { safeRedirectTarget } from '$lib/paths';
import { signIn } from '$lib/server/auth/auth';
import { currentSignInContext } from '$lib/server/auth/sign-in-context';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '$lib/server/db/demo-scenario';
import { signInSchema } from './schema';

export const load: PageServerLoad = async ({ locals, url }) => {
	const redirectTo = safeRedirectTarget(url.searchParams.get('redirectTo'));
	if (locals.user) {
		redirect(303, redirectTo);
	}
	const form = await superValidate({ redirectTo }, zod4(signInSchema), { errors: false });
	const demo =
		process.env.ORTHOGON_DEMO === '0'
			? null
			: {
					password: DEMO_PASSWORD,
					people: DEMO_SIGN_INS.map(({ email, role, team }) => ({ email, role, team }))
				};
	return { form, demo };
};

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(event.request, zod4(signInSchema));
		if (!form.valid) {
			return fail(400, { form });
		}
		const { email, password } = form.data;

		// Auth.js reads the credentials from the request body, which superforms has consumed.
		const body = new FormData();
		body.set('providerId', 'credentials');
		body.set('email', email);
		body.set('password', password);
		body.set('redirectTo', safeRedirectTarget(form.data.redirectTo));
		const headers = new Headers(event.request.headers);
		headers.delete('content-type');
		headers.delete('content-length');
		const request = new Request(event.request.url, { method: 'POST', headers, body });
		try {
			await signIn({ ...event, request });
		} catch (caught) {
			if (isRedirect(caught)) {
				throw caught;
			}
			if (caught instanceof Error && caught.name === 'CredentialsSignin') {
				form.data.password = '';
				// The limits are applied inside Auth.js (auth/sign-in.ts), which notes a refusal here.
				const retryAfterSeconds = currentSignInContext()?.retryAfterSeconds;
				if (retryAfterSeconds) {
					event.setHeaders({ 'retry-after': String(retryAfterSeconds) });
					const minutes = Math.ceil(retryAfterSeconds / 60);
					return message(
						form,
						`Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
						{
							status: 429
						}
					);
				}
				return message(form, 'That e-mail and password do not match an Orthogon account.', {
					status: 400
				});
			}
			throw caught;
		}
		return message(form, 'Sign-in did not complete. Please try again.', { status: 500 });
	}
};
