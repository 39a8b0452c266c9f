import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { createApiToken, listApiTokens, revokeApiToken } from '$lib/server/auth/api-tokens';
import { requireUser } from '$lib/server/auth/guards';
import { changeOwnPassword } from '$lib/server/services/users';
import { teamsOf } from '$lib/server/services/teams';
import { changePasswordSchema, createTokenSchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const [tokens, teams, tokenForm, passwordForm] = await Promise.all([
		listApiTokens(user.id),
		teamsOf(user.id),
		superValidate(zod4(createTokenSchema)),
		superValidate(zod4(changePasswordSchema))
	]);
	return {
		tokens: tokens.map((t) => ({ id: t.id, label: t.label, prefix: t.prefix, createdAt: t.createdAt, lastUsedAt: t.lastUsedAt })),
		teams,
		tokenForm,
		passwordForm
	};
};

export const actions: Actions = {
	createToken: async (event) => {
		const user = requireUser(event);
		const form = await superValidate(event.request, zod4(createTokenSchema));
		if (!form.valid) return fail(400, { tokenForm: form });
		const { token } = await createApiToken(user.id, form.data.label);
		form.data.label = '';
		return message(form, { token });
	},
	revokeToken: async (event) => {
		const user = requireUser(event);
		const id = String((await event.request.formData()).get('tokenId') ?? '');
		if (!(await revokeApiToken(user.id, id))) return fail(404, { problem: 'That token is already revoked.' });
		return { revoked: true };
	},
	changePassword: async (event) => {
		const user = requireUser(event);
		const form = await superValidate(event.request, zod4(changePasswordSchema));
		if (!form.valid) return fail(400, { passwordForm: form });
		if (!(await changeOwnPassword(user.id, form.data.current, form.data.next))) {
			return setError(form, 'current', 'That is not your current password.');
		}
		return message({ ...form, data: { current: '', next: '', confirm: '' } }, 'Your password was changed.');
	}
};
