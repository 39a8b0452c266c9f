import type { RequestEvent } from '@sveltejs/kit';
import {
	closeDatabase,
	dbReady,
	Membership,
	openDatabase,
	Project,
	Team,
	User
} from '../../src/lib/server/db';
import type { Role } from '../../src/lib/policy';
import type { SessionUser } from '../../src/lib/types';

/** A brand-new, migrated in-memory database for one test file or test. */
export async function freshDatabase() {
	await closeDatabase();
	openDatabase('sqlite::memory:');
	await dbReady();
}

let serial = 0;
const next = () => ++serial;

export async function makeUser(name = `Person ${next()}`): Promise<SessionUser> {
	const n = next();
	const user = await User.create({ email: `person${n}@lab.example`, name, passwordHash: null });
	return { id: user.id, email: user.email, name: user.name };
}

export async function makeTeam(name = `Team ${next()}`) {
	return Team.create({ name });
}

export async function join(user: SessionUser, teamId: string, role: Role) {
	return Membership.create({ userId: user.id, teamId, role });
}

export async function makeProject(teamId: string, name = `Project ${next()}`) {
	return Project.create({ teamId, name, description: '', createdById: null, archivedAt: null });
}

/** A team with one member in every role, plus an outsider who leads another team. */
export async function makeTeamWithEveryRole() {
	const team = await makeTeam('Bench team');
	const other = await makeTeam('Other team');
	const people = {
		lead: await makeUser('Lead'),
		chemist: await makeUser('Chemist'),
		reviewer: await makeUser('Reviewer'),
		viewer: await makeUser('Viewer'),
		outsider: await makeUser('Outsider')
	};
	for (const role of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
		await join(people[role], team.id, role);
	}
	await join(people.outsider, other.id, 'lead');
	return { team, other, people };
}

/** Just enough of a RequestEvent for guards and API handlers. */
export function fakeEvent(options: {
	user?: SessionUser | null;
	path?: string;
	method?: string;
	body?: unknown;
}): RequestEvent {
	const url = new URL(options.path ?? '/projects', 'http://localhost');
	const request = new Request(url, {
		method: options.method ?? 'GET',
		headers: { 'content-type': 'application/json' },
		body:
			options.body === undefined
				? undefined
				: typeof options.body === 'string'
					? options.body
					: JSON.stringify(options.body)
	});
	return {
		url,
		request,
		locals: { user: options.user ?? null, via: options.user ? 'session' : null },
		params: {},
		getClientAddress: () => '127.0.0.1'
	} as unknown as RequestEvent;
}

/** Calls an endpoint handler as `user` and reads its JSON answer, e.g. `callApi(POST, { user, method: 'POST', body })`. */
export async function callApi(
	handler: unknown,
	options: {
		user: SessionUser;
		method: string;
		body?: unknown;
		params?: Record<string, string>;
		path?: string;
	}
) {
	const event = fakeEvent({
		user: options.user,
		path: options.path ?? '/api/test',
		method: options.method,
		body: options.body
	}) as RequestEvent & { params: Record<string, string> };
	event.params = options.params ?? {};
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}
