import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { can, ROLE_LABELS, type Action, type Role } from '../../policy';
import { paths } from '../../paths';
import { Comment, dbReady, Project, Route, SavedCondition, User } from '../db';
import type { SessionUser } from './credentials';
import { callerRoleIn } from './memberships';

// Every page load, form action and API handler passes through these. The rules:
// no identity → sign-in page (pages) or 401 (API); not a member of the team → 404, so other
// teams' data is indistinguishable from data that does not exist; member without the grant → 403.

type GuardEvent = Pick<RequestEvent, 'locals' | 'url'>;

export function isApiPath(url: URL): boolean {
	return url.pathname === '/api' || url.pathname.startsWith('/api/');
}

/** The signed-in (or token-bearing) user; otherwise redirects to sign-in or answers 401. */
export function requireUser(event: GuardEvent): SessionUser {
	const user = event.locals.user;
	if (user) {
		return user;
	}
	if (isApiPath(event.url)) {
		error(401, {
			code: 'unauthenticated',
			message: 'Sign in, or send an API token as a Bearer token.'
		});
	}
	redirect(303, paths.signIn(event.url.pathname + event.url.search));
}

/**
 * The user, only when they signed in with their password (a browser session): an API token must
 * not mint more tokens, revoke them or change the password, or a leaked token would outlive itself.
 */
export function requirePasswordSession(event: GuardEvent): SessionUser {
	const user = requireUser(event);
	if (event.locals.via !== 'session') {
		error(403, {
			code: 'forbidden',
			message:
				'An API token cannot manage tokens or change the password. Sign in with your password to do that.'
		});
	}
	return user;
}

export function notFound(what = 'That'): never {
	error(404, { code: 'not_found', message: `${what} does not exist, or is not shared with you.` });
}

const ACTION_PHRASES: Record<Action, string> = {
	'project.read': 'read this team’s work',
	'project.create': 'create projects',
	'project.edit': 'rename or archive projects',
	'route.edit': 'edit routes',
	'route.comment': 'comment on routes',
	'route.review': 'review routes',
	'library.add': 'add to the condition library',
	'library.approve': 'approve condition library entries',
	'rules.override': 'change the team’s rule overrides',
	'team.manage': 'manage the team'
};

/** Passes when the user is in the team with a role that grants the action. */
export async function requireTeamAction(event: GuardEvent, teamId: string, action: Action) {
	return authorize(event, requireUser(event), teamId, action, 'That team');
}

/**
 * Checks the role from the caller's memberships, read once per request and shared with the
 * layout (auth/memberships.ts), never from the session: no role → 404 naming `what` (the team,
 * or the project or route reached through it), a role without the grant → 403.
 */
async function authorize(
	event: GuardEvent,
	user: SessionUser,
	teamId: string,
	action: Action,
	what: string
): Promise<{ user: SessionUser; role: Role }> {
	const role = await callerRoleIn(event, user.id, teamId);
	if (!role) {
		notFound(what);
	}
	if (!can(role, action)) {
		error(403, {
			code: 'forbidden',
			message: `As ${ROLE_LABELS[role].toLowerCase()} you cannot ${ACTION_PHRASES[action]}.`
		});
	}
	return { user, role };
}

// Ids reach these guards from route parameters the `uuid` matcher has already checked (src/params),
// or from forms and bodies whose schema or reader checks them; a non-uuid never gets this far.

/** Loads a project and checks the action against the role in the project's team. */
export async function requireProjectAction(event: GuardEvent, projectId: string, action: Action) {
	const user = requireUser(event);
	await dbReady();
	const project = await Project.findByPk(projectId);
	if (!project) {
		notFound('That project');
	}
	const { role } = await authorize(event, user, project.teamId, action, 'That project');
	return { user, role, project };
}

/** Loads a route and its project, and checks the action in the project's team. */
export async function requireRouteAction(event: GuardEvent, routeId: string, action: Action) {
	const user = requireUser(event);
	await dbReady();
	const route = await Route.findByPk(routeId, { include: [{ model: Project, as: 'project' }] });
	if (!route?.project) {
		notFound('That route');
	}
	const { role } = await authorize(event, user, route.project.teamId, action, 'That route');
	return { user, role, route, project: route.project };
}

/**
 * Loads a comment with its route and project, and checks the action in the project's team: a
 * comment is reached through its route, so another team's comment is a 404 like its route.
 */
export async function requireCommentAction(event: GuardEvent, commentId: string, action: Action) {
	const user = requireUser(event);
	await dbReady();
	const comment = await Comment.findByPk(commentId, {
		include: [{ model: User, as: 'author', attributes: ['id', 'name'] }]
	});
	const route = comment
		? await Route.findByPk(comment.routeId, { include: [{ model: Project, as: 'project' }] })
		: null;
	if (!comment || !route?.project) {
		notFound('That comment');
	}
	const { role } = await authorize(event, user, route.project.teamId, action, 'That comment');
	return { user, role, comment, route, project: route.project };
}

/**
 * Loads a saved condition of the team library with its author, and checks the action in its
 * team: another team's entry is a 404 like one that does not exist.
 */
export async function requireSavedConditionAction(
	event: GuardEvent,
	conditionId: string,
	action: Action
) {
	const user = requireUser(event);
	await dbReady();
	const entry = await SavedCondition.findByPk(conditionId, {
		include: [{ model: User, as: 'author', attributes: ['id', 'name'] }]
	});
	if (!entry) {
		notFound('That saved condition');
	}
	const { role } = await authorize(event, user, entry.teamId, action, 'That saved condition');
	return { user, role, entry };
}
