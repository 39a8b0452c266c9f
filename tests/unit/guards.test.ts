import { isHttpError, isRedirect } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { ACTIONS, can, ROLES } from '../../src/lib/policy';
import {
	requireProjectAction,
	requireRouteAction,
	requireTeamAction,
	requireUser
} from '../../src/lib/server/auth/guards';
import { forgetCallerMemberships, teamsOfCaller } from '../../src/lib/server/auth/memberships';
import { Membership } from '../../src/lib/server/db';
import { load as layoutLoad } from '../../src/routes/+layout.server';
import { load as projectPageLoad } from '../../src/routes/projects/[projectId=uuid]/+page.server';
import { createRoute } from '../../src/lib/server/services/routes';
import { actions as teamActions } from '../../src/routes/teams/[teamId=uuid]/+page.server';
import {
	fakeEvent,
	freshDatabase,
	join,
	makeProject,
	makeTeam,
	makeTeamWithEveryRole,
	makeUser
} from '../factories';

type Fixture = Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let f: Fixture;

async function outcome(run: () => Promise<unknown> | unknown): Promise<string> {
	try {
		await run();
		return 'allowed';
	} catch (caught) {
		if (isRedirect(caught)) {
			return `redirect ${caught.location}`;
		}
		if (isHttpError(caught)) {
			return String(caught.status);
		}
		throw caught;
	}
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

describe('requireUser', () => {
	it('sends a page visitor without a session to sign-in, keeping where they were going', async () => {
		expect(await outcome(() => requireUser(fakeEvent({ path: '/projects?archived=1' })))).toBe(
			'redirect /signin?redirectTo=%2Fprojects%3Farchived%3D1'
		);
	});
	it('answers 401 on the API', async () => {
		expect(await outcome(() => requireUser(fakeEvent({ path: '/api/projects' })))).toBe('401');
	});
	it('passes a signed-in user through', async () => {
		expect(requireUser(fakeEvent({ user: f.people.viewer })).id).toBe(f.people.viewer.id);
	});
});

describe('requireTeamAction: every role × every action', () => {
	for (const role of ROLES) {
		for (const action of ACTIONS) {
			const expected = can(role, action) ? 'allowed' : '403';
			it(`${role} → ${action}: ${expected}`, async () => {
				const event = fakeEvent({ user: f.people[role], path: '/api/projects' });
				expect(await outcome(() => requireTeamAction(event, f.team.id, action))).toBe(expected);
			});
		}
	}

	it('answers 404, not 403, to a lead of another team, for every action', async () => {
		for (const action of ACTIONS) {
			const event = fakeEvent({ user: f.people.outsider });
			expect(await outcome(() => requireTeamAction(event, f.team.id, action))).toBe('404');
		}
	});

	it('reads the role from the database on every request, so a role change applies at once', async () => {
		// A fresh event is a fresh request: nothing read for one request may serve the next.
		const request = () => fakeEvent({ user: f.people.viewer });
		expect(await outcome(() => requireTeamAction(request(), f.team.id, 'project.create'))).toBe(
			'403'
		);
		await Membership.update(
			{ role: 'chemist' },
			{ where: { userId: f.people.viewer.id, teamId: f.team.id } }
		);
		expect(await outcome(() => requireTeamAction(request(), f.team.id, 'project.create'))).toBe(
			'allowed'
		);
		await Membership.update(
			{ role: 'viewer' },
			{ where: { userId: f.people.viewer.id, teamId: f.team.id } }
		);
	});
});

describe('requireProjectAction', () => {
	it('finds the project for members and hides it from other teams', async () => {
		const project = await makeProject(f.team.id, 'Guarded project');
		const mine = await requireProjectAction(
			fakeEvent({ user: f.people.reviewer }),
			project.id,
			'project.read'
		);
		expect(mine.project.id).toBe(project.id);
		expect(mine.role).toBe('reviewer');
		expect(
			await outcome(() =>
				requireProjectAction(fakeEvent({ user: f.people.outsider }), project.id, 'project.read')
			)
		).toBe('404');
		expect(
			await outcome(() =>
				requireProjectAction(fakeEvent({ user: f.people.viewer }), project.id, 'project.edit')
			)
		).toBe('403');
	});
	// Ids that are not uuids never reach the guard: the `uuid` matcher answers 404 in the router
	// (tests/unit/text-and-ids.test.ts checks every id segment uses it).
	it('answers 404 for ids that do not exist', async () => {
		const event = fakeEvent({ user: f.people.lead });
		expect(
			await outcome(() =>
				requireProjectAction(event, '00000000-0000-4000-8000-000000000000', 'project.read')
			)
		).toBe('404');
	});
});

describe('one membership query per guarded request', () => {
	/** Reads of memberships by user id, counted by Sequelize's find hook (one per SELECT). */
	const membershipQueries = async (run: () => Promise<unknown>) => {
		let count = 0;
		Membership.addHook('beforeFind', 'countMembershipReads', (options) => {
			const where = options.where as Record<string, unknown> | undefined;
			if (where && 'userId' in where) {
				count += 1;
			}
		});
		try {
			await outcome(run);
			return count;
		} finally {
			Membership.removeHook('beforeFind', 'countMembershipReads');
		}
	};

	it('reads the caller’s role once for a project, a route and a team, allowed or refused', async () => {
		const project = await makeProject(f.team.id, 'Counted project');
		const route = await createRoute(f.people.lead, project, {
			name: 'Counted route',
			intermediates: [],
			steps: []
		});
		for (const person of [f.people.chemist, f.people.viewer, f.people.outsider]) {
			const request = () => fakeEvent({ user: person });
			expect(
				await membershipQueries(() => requireProjectAction(request(), project.id, 'route.edit')),
				`project, ${person.name}`
			).toBe(1);
			expect(
				await membershipQueries(() => requireRouteAction(request(), route.id, 'route.edit')),
				`route, ${person.name}`
			).toBe(1);
			expect(
				await membershipQueries(() => requireTeamAction(request(), f.team.id, 'route.edit')),
				`team, ${person.name}`
			).toBe(1);
		}
	});

	it('shares one read between the root layout and the page’s guard, run side by side as SvelteKit does', async () => {
		const project = await makeProject(f.team.id, 'Layout and page');
		const event = fakeEvent({ user: f.people.chemist, path: `/projects/${project.id}` });
		(event as { params: Record<string, string> }).params = { projectId: project.id };
		let layout: unknown;
		const queries = await membershipQueries(async () => {
			[layout] = await Promise.all([
				layoutLoad(event as Parameters<typeof layoutLoad>[0]),
				projectPageLoad(event as Parameters<typeof projectPageLoad>[0])
			]);
		});
		expect(queries).toBe(1);
		expect(layout).toMatchObject({ teams: [{ id: f.team.id, role: 'chemist' }] });
	});

	it('shows a role the caller changed in a team action to the layout rendered after it', async () => {
		const team = await makeTeam();
		const [stepsDown, staysLead] = [await makeUser(), await makeUser()];
		const mine = await join(stepsDown, team.id, 'lead');
		await join(staysLead, team.id, 'lead');
		const request = new Request(`http://localhost/teams/${team.id}?/changeRole`, {
			method: 'POST',
			body: new URLSearchParams({ membershipId: mine.id, role: 'viewer' })
		});
		const event = {
			...fakeEvent({ user: stepsDown, path: `/teams/${team.id}` }),
			request,
			params: { teamId: team.id }
		};
		const changeRole = teamActions.changeRole!;
		expect(await changeRole(event as Parameters<typeof changeRole>[0])).toBe(null);
		expect(await layoutLoad(event as Parameters<typeof layoutLoad>[0])).toMatchObject({
			teams: [{ id: team.id, role: 'viewer' }]
		});
	});

	it('never carries the memberships to the next request, and re-reads them after a change', async () => {
		const first = fakeEvent({ user: f.people.chemist });
		expect(await membershipQueries(() => requireTeamAction(first, f.team.id, 'route.edit'))).toBe(
			1
		);
		const second = fakeEvent({ user: f.people.chemist });
		expect(await membershipQueries(() => requireTeamAction(second, f.team.id, 'route.edit'))).toBe(
			1
		);
		forgetCallerMemberships(second);
		expect(await membershipQueries(() => teamsOfCaller(second, f.people.chemist.id))).toBe(1);
	});
});
