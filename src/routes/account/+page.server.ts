import { fail } from '@sveltejs/kit';
import { message, setError, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import {
	createApiToken,
	listApiTokens,
	revokeAllApiTokens,
	revokeApiToken
} from '$lib/server/auth/api-tokens';
import { requirePasswordSession, requireUser } from '$lib/server/auth/guards';
import { teamsOfCaller } from '$lib/server/auth/memberships';
import { endOtherSessions } from '$lib/server/auth/sessions';
import { commentMailsOn, setCommentMails } from '$lib/server/services/mail-preferences';
import { changeOwnPassword } from '$lib/server/services/users';
import {
	changePasswordDefaults,
	changePasswordSchema,
	createTokenSchema,
	mailChoicesSchema
} from './schema';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const [tokens, teams, tokenForm, passwordForm, commentMails] = await Promise.all([
		listApiTokens(user.id),
		teamsOfCaller(event, user.id),
		superValidate(zod4(createTokenSchema)),
		superValidate(changePasswordDefaults, zod4(changePasswordSchema), { errors: false }),
		commentMailsOn(user.id)
	]);
	const mailForm = await superValidate({ commentMails }, zod4(mailChoicesSchema), {
		errors: false
	});
	return {
		tokens: tokens.map((t) => ({
			id: t.id,
			label: t.label,
			prefix: t.prefix,
			createdAt: t.createdAt,
			lastUsedAt: t.lastUsedAt
		})),
		teams,
		tokenForm,
		passwordForm,
		mailForm
	};
};

export const actions: Actions = {
	createToken: async (event) => {
		const user = requirePasswordSession(event);
		const form = await superValidate(event.request, zod4(createTokenSchema));
		if (!form.valid) {
			return fail(400, { tokenForm: form });
		}
		const { token } = await createApiToken(user.id, form.data.label);
		form.data.label = '';
		return message(form, { token });
	},
	revokeToken: async (event) => {
		const user = requirePasswordSession(event);
		const id = String((await event.request.formData()).get('tokenId') ?? '');
		if (!(await revokeApiToken(user.id, id))) {
			return fail(404, { problem: 'That token is already revoked.' });
		}
		return { revoked: true };
	},
	mailChoices: async (event) => {
		const user = requireUser(event);
		const form = await superValidate(event.request, zod4(mailChoicesSchema));
		if (!form.valid) {
			return fail(400, { mailForm: form });
		}
		await setCommentMails(user.id, form.data.commentMails);
		return message(form, `Saved: comment mails are ${form.data.commentMails ? 'on' : 'off'}.`);
	},
	changePassword: async (event) => {
		const user = requirePasswordSession(event);
		const form = await superValidate(event.request, zod4(changePasswordSchema));
		if (!form.valid) {
			return fail(400, { passwordForm: form });
		}
		if (!(await changeOwnPassword(user.id, form.data.current, form.data.next))) {
			return setError(form, 'current', 'That is not your current password.');
		}
		// Whoever knew the old password is signed out everywhere else; this browser stays in.
		const ended = await endOtherSessions(user.id, event.locals.sessionId);
		const revoked = form.data.revokeTokens ? await revokeAllApiTokens(user.id) : 0;
		const done = [
			'Your password was changed.',
			`${ended} other session${ended === 1 ? ' was' : 's were'} signed out.`,
			form.data.revokeTokens
				? `${revoked} API token${revoked === 1 ? ' was' : 's were'} revoked.`
				: 'Your API tokens still work.'
		].join(' ');
		return message({ ...form, data: changePasswordDefaults }, done);
	}
};
