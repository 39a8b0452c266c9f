import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { message, superValidate } from 'sveltekit-superforms';
import { zod4 } from 'sveltekit-superforms/adapters';
import type { Actions, PageServerLoad } from './$types';
import { can } from '$lib/policy';
import { paths } from '$lib/paths';
import { isUuid } from '$lib/uuid';
import { notFound, requireProjectAction, requireRouteAction } from '$lib/server/auth/guards';
import {
	createRoute,
	duplicateRoute,
	listRoutes,
	setRouteArchived,
	type RouteSummary
} from '$lib/server/services/routes';
import { recentActivity } from '$lib/server/services/activity';
import { openCommentCounts } from '$lib/server/services/comments';
import {
	getProjectSummary,
	setProjectArchived,
	updateProject
} from '$lib/server/services/projects';
import { editProjectSchema, newRouteSchema } from './schema';

export const load: PageServerLoad = async (event) => {
	const { project, role } = await requireProjectAction(
		event,
		event.params.projectId,
		'project.read'
	);
	const showArchived = event.url.searchParams.has('archived');
	const [summary, activity, routes] = await Promise.all([
		getProjectSummary(project.id),
		recentActivity({ teamId: project.teamId, projectId: project.id }, 15),
		listRoutes(project.id, { includeArchived: showArchived }).then(withOpenComments)
	]);
	const [form, routeForm] = await Promise.all([
		superValidate(
			{ name: project.name, description: project.description },
			zod4(editProjectSchema)
		),
		superValidate(zod4(newRouteSchema))
	]);
	return {
		project: summary!,
		role,
		canEdit: can(role, 'project.edit'),
		canEditRoutes: can(role, 'route.edit'),
		activity,
		form,
		routeForm,
		routes,
		showArchived
	};
};

export const actions: Actions = {
	update: async (event) => {
		const { project, user } = await requireProjectAction(
			event,
			event.params.projectId,
			'project.edit'
		);
		const form = await superValidate(event.request, zod4(editProjectSchema));
		if (!form.valid) {
			return fail(400, { form });
		}
		await updateProject(user, project, form.data);
		return message(form, 'Saved.');
	},
	archive: async (event) => {
		const { project, user } = await requireProjectAction(
			event,
			event.params.projectId,
			'project.edit'
		);
		await setProjectArchived(user, project, true);
	},
	restore: async (event) => {
		const { project, user } = await requireProjectAction(
			event,
			event.params.projectId,
			'project.edit'
		);
		await setProjectArchived(user, project, false);
	},
	createRoute: async (event) => {
		const { project, user } = await requireProjectAction(
			event,
			event.params.projectId,
			'route.edit'
		);
		const routeForm = await superValidate(event.request, zod4(newRouteSchema));
		if (!routeForm.valid) {
			return fail(400, { routeForm });
		}
		const route = await createRoute(user, project, {
			name: routeForm.data.name,
			intermediates: [],
			steps: []
		});
		redirect(303, paths.route(route.id));
	},
	duplicateRoute: async (event) => {
		const { user, route, project } = await routeOfThisProject(event);
		await duplicateRoute(user, project, route);
	},
	archiveRoute: async (event) => {
		const { user, route, project } = await routeOfThisProject(event);
		await setRouteArchived(user, route, true, project.teamId);
	},
	restoreRoute: async (event) => {
		const { user, route, project } = await routeOfThisProject(event);
		await setRouteArchived(user, route, false, project.teamId);
	}
};

/** Each route with its number of unresolved comments (0 when it has none). */
async function withOpenComments(routes: RouteSummary[]) {
	const open = await openCommentCounts(routes.map((route) => route.id));
	return routes.map((route) => ({ ...route, openComments: open[route.id] ?? 0 }));
}

/** The route a row action names, refused unless it belongs to this page's project. */
async function routeOfThisProject(event: RequestEvent<{ projectId: string }>) {
	const routeId = String((await event.request.formData()).get('routeId') ?? '');
	// A form field, not a path segment: no matcher has checked it (PostgreSQL refuses non-uuids).
	if (!isUuid(routeId)) {
		notFound('That route');
	}
	const found = await requireRouteAction(event, routeId, 'route.edit');
	if (found.route.projectId !== event.params.projectId) {
		notFound('That route');
	}
	return found;
}
