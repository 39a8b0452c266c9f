import { isHttpError, isRedirect, type RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import {
	concrete,
	discoverEndpoints,
	routeModule,
	type Endpoint as Entry
} from '../factories/route-tree';
import { TeamRuleOverride } from '../../src/lib/server/db';
import { addComment } from '../../src/lib/server/services/comment-writes';
import type { SessionUser } from '../../src/lib/types';
import { createRoute } from '../../src/lib/server/services/routes';
import { addEntry } from '../factories/library';

// Every endpoint method and form action in the route tree, run as every kind of caller. The list
// of endpoints is read from src/routes, so a new one fails this test until it is added to
// EXPECTED below with what each caller should get.

const CALLERS = ['lead', 'chemist', 'reviewer', 'viewer', 'outsider', 'anonymous'] as const;
type Caller = (typeof CALLERS)[number];
/** 'ok': passed the guards (2xx, 3xx, or a 4xx about the body); the rest are guard refusals. */
type Outcome = 'ok' | 'sign-in' | '401' | '403' | '404';
type Expectation = Record<Caller, Outcome> | { skip: string };

const row = (
	lead: Outcome,
	chemist: Outcome,
	reviewer: Outcome,
	viewer: Outcome,
	outsider: Outcome,
	anonymous: Outcome
) => ({ lead, chemist, reviewer, viewer, outsider, anonymous });
// API: 401 without identity, 404 for another team, 403 for a role without the grant.
const apiAnyone = row('ok', 'ok', 'ok', 'ok', 'ok', '401');
const apiRead = row('ok', 'ok', 'ok', 'ok', '404', '401');
const apiEdit = row('ok', 'ok', '403', '403', '404', '401');
const apiComment = row('ok', 'ok', 'ok', '403', '404', '401');
const apiLead = row('ok', '403', '403', '403', '404', '401');
// Pages: the sign-in page instead of 401.
const pageAnyone = row('ok', 'ok', 'ok', 'ok', 'ok', 'sign-in');
const pageEdit = row('ok', 'ok', '403', '403', '404', 'sign-in');
const pageManage = row('ok', '403', '403', '403', '404', 'sign-in');
const AUTH_JS = {
	skip: 'Auth.js and one-time links, no role involved: tests/e2e/sign-in.spec.ts and the auth tests'
};

const EXPECTED: Record<string, Expectation> = {
	'fallback /api/[...rest]': row('404', '404', '404', '404', '404', '404'),
	'POST /api/analyze': apiAnyone,
	'POST /api/check': apiAnyone,
	'POST /api/plan': apiAnyone,
	'POST /api/quantities': apiAnyone,
	'GET /api/azeotropes': apiAnyone,
	'GET /api/rules': apiAnyone,
	'GET /api/projects': apiAnyone,
	'POST /api/projects': row('ok', 'ok', '403', '403', '404', '401'),
	'GET /api/projects/[projectId=uuid]/routes': apiRead,
	'POST /api/projects/[projectId=uuid]/routes': apiEdit,
	'POST /api/projects/[projectId=uuid]/routes/import': apiEdit,
	'GET /api/routes/[routeId=uuid]': apiRead,
	'PUT /api/routes/[routeId=uuid]': apiEdit,
	'GET /api/routes/[routeId=uuid]/check': apiRead,
	'GET /api/routes/[routeId=uuid]/export': apiRead,
	'POST /api/routes/[routeId=uuid]/plan': apiRead,
	'POST /api/routes/[routeId=uuid]/plan/[rank=rank]/save': apiEdit,
	// Every member reaches the service; which role may take which action (the body says) is
	// tested action by action in api-review.test.ts.
	'POST /api/routes/[routeId=uuid]/review': apiRead,
	'GET /api/routes/[routeId=uuid]/comments': apiRead,
	'POST /api/routes/[routeId=uuid]/comments': apiComment,
	'PATCH /api/comments/[commentId=uuid]': apiComment,
	// Leads only, of any team: the outsider leads the other team and reads that team's outbox.
	'GET /api/outbox': row('ok', '403', '403', '403', 'ok', '401'),
	// Without teamId the list is of the caller's own teams, so the outsider reads their own.
	'GET /api/library': apiAnyone,
	'POST /api/library': apiEdit,
	// The entry is the chemist's: its author or a lead may change or delete it.
	'PATCH /api/library/[conditionId=uuid]': apiEdit,
	'DELETE /api/library/[conditionId=uuid]': apiEdit,
	'POST /api/library/[conditionId=uuid]/approve': row('ok', '403', '403', '403', '404', '401'),
	'GET /api/library/export': apiRead,
	'POST /api/library/import': apiEdit,
	'GET /api/teams/[teamId=uuid]/rules': apiRead,
	'POST /api/teams/[teamId=uuid]/rules': apiLead,
	'DELETE /api/teams/[teamId=uuid]/rules/[overrideId=uuid]': apiLead,
	'action createToken /account': pageAnyone,
	'action revokeToken /account': pageAnyone,
	'action changePassword /account': pageAnyone,
	'action mailChoices /account': pageAnyone,
	'action create /projects': row('ok', 'ok', '403', '403', '404', 'sign-in'),
	'action update /projects/[projectId=uuid]': pageEdit,
	'action archive /projects/[projectId=uuid]': pageEdit,
	'action restore /projects/[projectId=uuid]': pageEdit,
	'action createRoute /projects/[projectId=uuid]': pageEdit,
	'action duplicateRoute /projects/[projectId=uuid]': pageEdit,
	'action archiveRoute /projects/[projectId=uuid]': pageEdit,
	'action restoreRoute /projects/[projectId=uuid]': pageEdit,
	'action add /teams/[teamId=uuid]': pageManage,
	'action changeRole /teams/[teamId=uuid]': pageManage,
	'action remove /teams/[teamId=uuid]': pageManage,
	// The library page guards the team (save) or the entry's team (the row buttons) itself, then
	// calls the library API, which decides author-or-lead.
	'action save /library': pageEdit,
	'action approve /library': pageManage,
	'action retire /library': pageEdit,
	'action restore /library': pageEdit,
	'action delete /library': pageEdit,
	'action add /teams/[teamId=uuid]/rules': pageManage,
	'action remove /teams/[teamId=uuid]/rules': pageManage,
	'action default /signin': AUTH_JS,
	'action default /signout': AUTH_JS,
	'action default /set-password/[token]': AUTH_JS
};

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let entries: Entry[] = [];
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	entries = await discoverEndpoints();
}, 120_000);

async function outcomeOf(run: () => unknown): Promise<Outcome> {
	try {
		const result = await run();
		const status = result instanceof Response ? result.status : 200;
		if (status === 401 || status === 403) {
			return String(status) as Outcome;
		}
		// The API's catch-all says 404 in its own words; a guard's 404 says "not shared with you".
		if (status === 404 && result instanceof Response) {
			const body = (await result.json()) as { error: { code: string } };
			return body.error.code === 'not_found' ? '404' : 'ok';
		}
		return 'ok';
	} catch (caught) {
		if (isRedirect(caught)) {
			return caught.location.startsWith('/signin') ? 'sign-in' : 'ok';
		}
		if (isHttpError(caught) && [401, 403, 404].includes(caught.status)) {
			return String(caught.status) as Outcome;
		}
		if (isHttpError(caught)) {
			return 'ok';
		}
		throw caught;
	}
}

async function call(entry: Entry, caller: Caller): Promise<Outcome> {
	const project = await makeProject(f.team.id, 'Role table project');
	const route = await createRoute(f.people.chemist, project, {
		name: 'Role table route',
		intermediates: [],
		steps: []
	});
	const comment = await addComment(f.people.chemist, route, project, { body: 'Role table' });
	const saved = await addEntry(f.people.chemist, f.team.id);
	const override = await TeamRuleOverride.create({
		teamId: f.team.id,
		subject: 'TBS',
		condition: 'heat',
		reagent: null,
		rating: 'caution',
		reason: 'Role table',
		source: 'Role table',
		authorId: f.people.lead.id
	});
	const ids: Record<string, string> = {
		conditionId: saved.id,
		projectId: project.id,
		routeId: route.id,
		commentId: comment.id,
		teamId: f.team.id,
		overrideId: override.id,
		rank: '1',
		token: 'x'
	};
	const { params, path } = concrete(entry.route, ids);
	const user = caller === 'anonymous' ? null : f.people[caller];
	const module = await routeModule(entry.file);
	if (entry.key === 'POST /api/library/import') {
		return outcomeOf(() => (module.POST as (e: unknown) => unknown)(libraryImport(user, path)));
	}
	if (entry.kind === 'method') {
		const body =
			entry.key === 'POST /api/projects'
				? { teamId: f.team.id, name: 'Role table' }
				: entry.key === 'POST /api/library'
					? { teamId: f.team.id, protectingGroup: 'TBS', kind: 'install', reagents: 'TBSCl' }
					: ['GET', 'fallback'].includes(entry.name)
						? undefined
						: {};
		const event = fakeEvent({
			user,
			path: entry.key === 'GET /api/library/export' ? `${path}?teamId=${f.team.id}` : path,
			method: entry.name === 'fallback' ? 'GET' : entry.name,
			body
		});
		Object.assign(event, { params });
		return outcomeOf(() => (module[entry.name] as (e: RequestEvent) => unknown)(event));
	}
	const form = new URLSearchParams({
		teamId: f.team.id,
		name: 'Role table',
		routeId: route.id,
		id: saved.id
	});
	const url = new URL(`${path}?/${entry.name}`, 'http://localhost');
	const request = new Request(url, {
		method: 'POST',
		body: form,
		headers: { 'content-type': 'application/x-www-form-urlencoded' }
	});
	const event = {
		url,
		request,
		params,
		locals: { user, via: user ? 'session' : null },
		getClientAddress: () => '127.0.0.1',
		cookies: { get: () => undefined, set: () => undefined, delete: () => undefined }
	};
	const actions = module.actions as Record<string, (e: unknown) => unknown>;
	return outcomeOf(() => actions[entry.name]!(event));
}

/** The library import reads its team from a multipart form, so the table sends one. */
function libraryImport(user: SessionUser | null, path: string) {
	const form = new FormData();
	form.set('teamId', f.team.id);
	form.set('file', new File(['protectingGroup,kind,reagents\nTBS,install,TBSCl'], 'roles.csv'));
	const request = new Request(new URL(path, 'http://localhost'), { method: 'POST', body: form });
	return { url: new URL(request.url), request, locals: { user, via: user ? 'session' : null } };
}

describe('role × endpoint, from the route tree', () => {
	it('finds every endpoint and form action in the table, and nothing in the table that is gone', () => {
		const found = entries.map((e) => e.key).sort();
		expect(
			found.filter((key) => !(key in EXPECTED)),
			'add these to EXPECTED'
		).toEqual([]);
		expect(
			Object.keys(EXPECTED).filter((key) => !found.includes(key)),
			'remove these from EXPECTED'
		).toEqual([]);
	});

	it('gives every caller the expected answer on every endpoint and action', async () => {
		const wrong: string[] = [];
		for (const entry of entries) {
			const expected = EXPECTED[entry.key];
			if (!expected || 'skip' in expected) {
				continue;
			}
			for (const caller of CALLERS) {
				const got = await call(entry, caller);
				if (got !== expected[caller]) {
					wrong.push(`${entry.key} as ${caller}: expected ${expected[caller]}, got ${got}`);
				}
			}
		}
		expect(wrong).toEqual([]);
	}, 170_000);
});
