import { fail } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { can } from '$lib/policy';
import { requireProjectAction } from '$lib/server/auth/guards';
import { recentActivity } from '$lib/server/services/activity';
import { getProjectSummary, setProjectArchived, updateProject } from '$lib/server/services/projects';
import { editProjectSchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const { project, role } = await requireProjectAction(event, event.params.projectId, 'project.read');
	const [summary, activity] = await Promise.all([
		getProjectSummary(project.id),
		recentActivity({ teamId: project.teamId, projectId: project.id }, 15)
	]);
	const form = await superValidate(
		{ name: project.name, description: project.description },
		zod4(editProjectSchema)
	);
	return { project: summary!, role, canEdit: can(role, 'project.edit'), activity, form };
};

export const actions: Actions = {
	update: async (event) => {
		const { project, user } = await requireProjectAction(event, event.params.projectId, 'project.edit');
		const form = await superValidate(event.request, zod4(editProjectSchema));
		if (!form.valid) return fail(400, { form });
		await updateProject(user, project, form.data);
		return message(form, 'Saved.');
	},
	archive: async (event) => {
		const { project, user } = await requireProjectAction(event, event.params.projectId, 'project.edit');
		await setProjectArchived(user, project, true);
	},
	restore: async (event) => {
		const { project, user } = await requireProjectAction(event, event.params.projectId, 'project.edit');
		await setProjectArchived(user, project, false);
	}
};
