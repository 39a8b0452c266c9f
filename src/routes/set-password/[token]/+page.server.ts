import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { newPasswordSchema } from '$lib/schemas/password';
import { setPasswordLinkOwner, setPasswordWithLink } from '$lib/server/services/set-password-links';

export const load: PageServerLoad = async ({ params }) => {
	const owner = await setPasswordLinkOwner(params.token);
	return { owner, form: await superValidate(zod4(newPasswordSchema)) };
};

export const actions: Actions = {
	default: async (event) => {
		const form = await superValidate(event.request, zod4(newPasswordSchema));
		if (!form.valid) {
			return fail(400, { form, spent: false });
		}
		if (!(await setPasswordWithLink(event.params.token, form.data.password))) {
			return fail(410, { form, spent: true });
		}
		redirect(303, '/signin?passwordSet=1');
	}
};
