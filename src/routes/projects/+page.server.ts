import { fail, redirect } from '@sveltejs/kit';
import { superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { paths } from '$lib/paths';
import { can } from '$lib/policy';
import { requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { teamsOfCaller } from '$lib/server/auth/memberships';
import { createProject, listProjectsFor } from '$lib/server/services/projects';
import { createProjectSchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const user = requireUser(event);
	const showArchived = event.url.searchParams.get('archived') === '1';
	const [projects, teams] = await Promise.all([
		listProjectsFor(user.id, { includeArchived: showArchived }),
		teamsOfCaller(event, user.id)
	]);
	const creatableTeams = teams.filter((t) => can(t.role, 'project.create'));
	const form = await superValidate({ teamId: creatableTeams[0]?.id }, zod4(createProjectSchema), {
		errors: false
	});
	return { projects, teams, creatableTeams, showArchived, form };
};

export const actions: Actions = {
	create: async (event) => {
		const form = await superValidate(event.request, zod4(createProjectSchema));
		if (!form.valid) {
			return fail(400, { form });
		}
		const { user } = await requireTeamAction(event, form.data.teamId, 'project.create');
		const project = await createProject(user, form.data);
		redirect(303, paths.project(project.id));
	}
};
