import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler, readJson } from '$lib/server/api';
import { requireTeamAction, requireUser } from '$lib/server/auth/guards';
import { newProjectSchema } from '$lib/schemas/project';
import { createProject, listProjectsFor } from '$lib/server/services/projects';

/** `GET /api/projects` → `{ projects: [{ id, name, teamId, teamName }] }`, the caller's teams only. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const user = requireUser(event);
	const projects = await listProjectsFor(user.id);
	return json({
		projects: projects.map(({ id, name, teamId, teamName }) => ({ id, name, teamId, teamName }))
	});
});

/** `POST /api/projects` `{ name, teamId, description? }` → `201 { id }`. */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const body = await readJson(event, newProjectSchema);
	const { user } = await requireTeamAction(event, body.teamId, 'project.create');
	const project = await createProject(user, body);
	return json({ id: project.id }, { status: 201 });
});
