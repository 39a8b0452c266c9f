/**
 * Who may do what in a team. Pure data and one function, shared by the server guards (which
 * enforce it) and the pages (which only hide what a role cannot use).
 */
export const ROLES = ['lead', 'chemist', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
	lead: 'Lead',
	chemist: 'Chemist',
	reviewer: 'Reviewer',
	viewer: 'Viewer'
};

export const ROLE_SUMMARIES: Record<Role, string> = {
	lead: 'Runs the team: members, roles, library approvals, the team’s rule overrides, and all chemist work.',
	chemist: 'Creates projects and routes, edits structures and steps, adds library entries.',
	reviewer: 'Reads routes, comments on steps, approves or asks for changes.',
	viewer: 'Reads everything the team shares.'
};

export const ACTIONS = [
	'project.read',
	'project.create',
	'project.edit',
	'route.edit',
	'route.comment',
	'route.review',
	'library.add',
	'library.approve',
	'rules.override',
	'team.manage'
] as const;
export type Action = (typeof ACTIONS)[number];

const GRANTS: Record<Role, readonly Action[]> = {
	lead: ACTIONS,
	chemist: [
		'project.read',
		'project.create',
		'project.edit',
		'route.edit',
		'route.comment',
		'library.add'
	],
	reviewer: ['project.read', 'route.comment', 'route.review'],
	viewer: ['project.read']
};

/** Whether a role may take an action, e.g. `can('reviewer', 'route.edit') === false`. */
export function can(role: Role | null | undefined, action: Action): boolean {
	return role ? GRANTS[role].includes(action) : false;
}

export function isRole(value: unknown): value is Role {
	return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
