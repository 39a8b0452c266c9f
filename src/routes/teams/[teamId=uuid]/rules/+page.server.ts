import { error, fail } from '@sveltejs/kit';
import { message, setError, superValidate, type Infer } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { can } from '$lib/policy';
import { ApiFailure } from '$lib/server/api';
import { requireTeamAction } from '$lib/server/auth/guards';
import { getTeam } from '$lib/server/services/teams';
import {
	addOverride,
	listOverrides,
	OverrideRefused,
	removeOverride
} from '$lib/server/services/team-rules';
import { overrideChoices, teamRuleGrid } from '$lib/server/team-rules-view';
import { addOverrideSchema, removeOverrideSchema, type OverrideMessage } from './schema';

export const load: PageServerLoad = async (event) => {
	const { teamId } = event.params;
	const { role } = await requireTeamAction(event, teamId, 'project.read');
	const [team, overrides, view, addForm] = await Promise.all([
		getTeam(teamId),
		listOverrides(teamId),
		teamRuleGrid(teamId),
		superValidate<Infer<typeof addOverrideSchema>, OverrideMessage>(zod4(addOverrideSchema))
	]);
	if (!team) {
		error(404, { code: 'not_found', message: 'That team does not exist.' });
	}
	return {
		team: { id: team.id, name: team.name },
		overrides,
		grid: view.grid,
		unfitRules: view.unfit,
		choices: overrideChoices(),
		addForm,
		canOverride: can(role, 'rules.override')
	};
};

export const actions: Actions = {
	add: async (event) => {
		const { user } = await requireTeamAction(event, event.params.teamId, 'rules.override');
		const form = await superValidate<Infer<typeof addOverrideSchema>, OverrideMessage>(
			event.request,
			zod4(addOverrideSchema)
		);
		if (!form.valid) {
			return fail(400, { addForm: form });
		}
		try {
			const body = { ...form.data, reagent: form.data.reagent || undefined };
			await addOverride(user, event.params.teamId, body);
			return message(form, {
				text: 'The team rule is set; the table shows it.',
				tone: 'success'
			});
		} catch (caught) {
			if (caught instanceof OverrideRefused) {
				return setError(form, caught.field, caught.reason);
			}
			if (caught instanceof ApiFailure && caught.status === 409) {
				return message(form, { text: caught.message, tone: 'problem' }, { status: 409 });
			}
			throw caught;
		}
	},
	remove: async (event) => {
		const { user } = await requireTeamAction(event, event.params.teamId, 'rules.override');
		const parsed = removeOverrideSchema.safeParse(
			Object.fromEntries(await event.request.formData())
		);
		if (!parsed.success) {
			return fail(400, { problem: 'That team rule was not found.' });
		}
		try {
			await removeOverride(user, event.params.teamId, parsed.data.overrideId);
			return { removed: true };
		} catch (caught) {
			if (caught instanceof ApiFailure && caught.status === 404) {
				return fail(404, { problem: 'That team rule was already removed.' });
			}
			throw caught;
		}
	}
};
