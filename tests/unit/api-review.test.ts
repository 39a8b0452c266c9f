// Source of every expectation here: the issue 15 contract (review status, roles, transitions,
// edit after approval), not the code under test.
import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import * as review from '../../src/routes/api/routes/[routeId=uuid]/review/+server';
import { ActivityEvent, ReviewEvent, Route, type Project } from '../../src/lib/server/db';
import type { RouteStatus } from '../../src/lib/review/contract';
import { approvedVersionOf, reviewHistory } from '../../src/lib/server/services/review';
import { takeReviewAction } from '../../src/lib/server/services/review-actions';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';
import { approvalsAgainstSaves, parallelVerdicts } from '../factories/review-races';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
type Who = keyof typeof f.people;

const doc = (name = 'Keto ester route') => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC1(CCC(=O)OC)OCCO1' }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'ethylene glycol, TsOH, toluene' }]
});

async function call(
	handler: unknown,
	who: Who,
	params: Record<string, string>,
	method = 'GET',
	body?: unknown
) {
	const event = fakeEvent({ user: f.people[who], path: '/api/x', method, body }) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = params;
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

const act = (who: Who, routeId: string, body: Record<string, unknown>) =>
	call(review.POST, who, { routeId }, 'POST', body);

/** A new route by the chemist, put straight into `status` (the database, not the API). */
async function routeIn(status: RouteStatus = 'draft', name = 'Keto ester route') {
	const created = await call(
		routeList.POST,
		'chemist',
		{ projectId: project.id },
		'POST',
		doc(name)
	);
	expect(created.status).toBe(201);
	await Route.update({ status }, { where: { id: created.body.id } });
	return created.body.id as string;
}

const stored = async (routeId: string) => (await Route.findByPk(routeId))!;

/** A body each action accepts when the status fits. */
const validBody = () => ({
	request: { action: 'request', reviewers: [f.people.reviewer.email] },
	approve: { action: 'approve' },
	'request-changes': { action: 'request-changes', note: 'Step 1: say which acid.' },
	withdraw: { action: 'withdraw' }
});

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Review project');
});

describe('who may take which review action', () => {
	// The issue: request (lead, chemist); approve and request-changes (reviewer, lead); chemist or
	// viewer approving → 403; another team → 404. Withdraw belongs to those who asked.
	const allowed = {
		request: ['lead', 'chemist'],
		approve: ['lead', 'reviewer'],
		'request-changes': ['lead', 'reviewer'],
		withdraw: ['lead', 'chemist']
	} as const;
	const startsFrom = {
		request: 'draft',
		approve: 'in-review',
		'request-changes': 'in-review',
		withdraw: 'in-review'
	} as const;
	const results = {
		request: 'in-review',
		approve: 'approved',
		'request-changes': 'changes-requested',
		withdraw: 'draft'
	} as const;

	for (const action of ['request', 'approve', 'request-changes', 'withdraw'] as const) {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer', 'outsider'] as const) {
			const may = (allowed[action] as readonly string[]).includes(who);
			const expected = may ? 200 : who === 'outsider' ? 404 : 403;
			it(`${action} by ${who} → ${expected}`, async () => {
				const routeId = await routeIn(startsFrom[action]);
				const before = await stored(routeId);
				const answer = await act(who, routeId, validBody()[action]);
				expect(answer.status).toBe(expected);
				const after = await stored(routeId);
				expect(after.version).toBe(before.version);
				if (may) {
					expect(answer.body).toEqual({ status: results[action], version: before.version });
					expect(after.status).toBe(results[action]);
					expect(await ReviewEvent.count({ where: { routeId, action } })).toBe(1);
				} else {
					expect(answer.body.error.code).toBe(who === 'outsider' ? 'not_found' : 'forbidden');
					expect(after.status).toBe(startsFrom[action]);
					expect(await ReviewEvent.count({ where: { routeId } })).toBe(0);
				}
			});
		}
	}

	it('says who may when it refuses', async () => {
		const routeId = await routeIn('in-review');
		const chemist = await act('chemist', routeId, { action: 'approve' });
		expect(chemist.body.error.message).toBe(
			'As chemist you cannot approve a route; only a lead or a reviewer can.'
		);
		const reviewer = await act('reviewer', routeId, { action: 'withdraw' });
		expect(reviewer.body.error.message).toMatch(/only a lead or a chemist can\.$/);
	});

	it('checks the role before the status: a chemist approving a draft hears 403, not 409', async () => {
		const routeId = await routeIn('draft');
		expect((await act('chemist', routeId, { action: 'approve' })).status).toBe(403);
	});
});

describe('which transitions the status allows', () => {
	// From the issue: draft → in-review → changes-requested | approved; approve and
	// request-changes only while in review; an approved route returns to draft by an edit.
	const table: [RouteStatus, keyof ReturnType<typeof validBody>, RouteStatus | RegExp][] = [
		['draft', 'request', 'in-review'],
		['changes-requested', 'request', 'in-review'],
		['in-review', 'request', /already in review/],
		['approved', 'request', /approved; edit it to return it to draft, then ask for review again/],
		['in-review', 'approve', 'approved'],
		['draft', 'approve', /draft: nobody has asked for its review yet/],
		['changes-requested', 'approve', /sent for review again/],
		['approved', 'approve', /already approved/],
		['in-review', 'request-changes', 'changes-requested'],
		['draft', 'request-changes', /draft/],
		['changes-requested', 'request-changes', /already requested/],
		['approved', 'request-changes', /approved; edit it to return it to draft/],
		['in-review', 'withdraw', 'draft'],
		['changes-requested', 'withdraw', 'draft'],
		['draft', 'withdraw', /nothing to withdraw/],
		['approved', 'withdraw', /approval cannot be withdrawn/]
	];
	for (const [from, action, outcome] of table) {
		const verdict = typeof outcome === 'string' ? `→ ${outcome}` : '→ 409';
		it(`${action} on a ${from} route ${verdict}`, async () => {
			const routeId = await routeIn(from);
			const answer = await act('lead', routeId, validBody()[action]);
			if (typeof outcome === 'string') {
				expect(answer.status).toBe(200);
				expect(answer.body.status).toBe(outcome);
				expect((await stored(routeId)).status).toBe(outcome);
			} else {
				expect(answer.status).toBe(409);
				expect(answer.body.error.code).toBe('invalid_transition');
				expect(answer.body.error.message).toMatch(outcome);
				expect(answer.body.error.details).toEqual({ status: from, action });
				expect((await stored(routeId)).status).toBe(from);
				expect(await ReviewEvent.count({ where: { routeId } })).toBe(0);
			}
		});
	}
});

describe('what a review action needs', () => {
	it('refuses a request without reviewers, or naming anyone who may not review, with 422', async () => {
		const routeId = await routeIn('draft');
		const none = await act('chemist', routeId, { action: 'request' });
		expect(none.status).toBe(422);
		expect(none.body.error.code).toBe('reviewers_required');
		expect((await act('chemist', routeId, { action: 'request', reviewers: [] })).status).toBe(422);
		for (const who of ['viewer', 'chemist', 'outsider'] as const) {
			const email = f.people[who].email;
			const answer = await act('chemist', routeId, {
				action: 'request',
				reviewers: [f.people.reviewer.email, email]
			});
			expect(answer.status).toBe(422);
			expect(answer.body.error.code).toBe('not_a_reviewer');
			expect(answer.body.error.message).toContain(email);
		}
		const stranger = await act('chemist', routeId, {
			action: 'request',
			reviewers: ['nobody@elsewhere.example']
		});
		expect(stranger.body.error.message).toContain('nobody@elsewhere.example');
		expect((await stored(routeId)).status).toBe('draft');
		expect(await ReviewEvent.count({ where: { routeId } })).toBe(0);
	});

	it('records who asked whom, matching e-mails without regard to case', async () => {
		const routeId = await routeIn('draft');
		const answer = await act('chemist', routeId, {
			action: 'request',
			reviewers: [f.people.reviewer.email.toUpperCase(), f.people.lead.email],
			note: 'Please look at the ketal step.'
		});
		expect(answer.status).toBe(200);
		const [entry] = await reviewHistory(routeId);
		expect(entry).toMatchObject({
			action: 'request',
			actor: { id: f.people.chemist.id, name: 'Chemist' },
			note: 'Please look at the ketal step.',
			version: 1
		});
		expect(entry!.reviewers.map((p) => p.name).sort()).toEqual(['Lead', 'Reviewer']);
	});

	it('refuses a request for changes without a note (blank counts as none) with 422', async () => {
		const routeId = await routeIn('in-review');
		for (const body of [{ action: 'request-changes' }, { action: 'request-changes', note: '  ' }]) {
			const answer = await act('reviewer', routeId, body);
			expect(answer.status).toBe(422);
			expect(answer.body.error.code).toBe('note_required');
		}
		expect((await stored(routeId)).status).toBe('in-review');
	});

	it('refuses a note holding a NUL (400, with the message), storing nothing', async () => {
		const routeId = await routeIn('in-review');
		const answer = await act('reviewer', routeId, {
			action: 'request-changes',
			note: 'Step 2\u0000: which acid?'
		});
		expect(answer.status).toBe(400);
		expect(JSON.stringify(answer.body.error.details)).toMatch(/control characters/);
		expect((await stored(routeId)).status).toBe('in-review');
		expect(await ReviewEvent.count({ where: { routeId } })).toBe(0);
	});

	it('records the approved version and the approver, without bumping the version', async () => {
		const routeId = await routeIn('draft');
		const saved = await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
			version: 1,
			document: doc('Keto ester route, revised')
		});
		expect(saved.body.version).toBe(2);
		await act('chemist', routeId, { action: 'request', reviewers: [f.people.reviewer.email] });
		const approved = await act('reviewer', routeId, { action: 'approve', note: 'Fine as drawn.' });
		expect(approved).toEqual({ status: 200, body: { status: 'approved', version: 2 } });
		const history = await reviewHistory(routeId);
		expect(history.find((e) => e.action === 'approve')).toMatchObject({
			action: 'approve',
			actor: { id: f.people.reviewer.id, name: 'Reviewer' },
			note: 'Fine as drawn.',
			version: 2
		});
		const got = await call(oneRoute.GET, 'viewer', { routeId });
		expect(got.body).toMatchObject({ status: 'approved', version: 2, approvedVersion: 2 });
	});

	it('refuses a stale version with 409 version_conflict and changes nothing', async () => {
		const routeId = await routeIn('in-review');
		await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', { version: 1, document: doc() });
		const stale = await act('reviewer', routeId, { action: 'approve', version: 1 });
		expect(stale.status).toBe(409);
		expect(stale.body.error.code).toBe('version_conflict');
		expect(stale.body.error.details).toEqual({ currentVersion: 2 });
		expect((await stored(routeId)).status).toBe('in-review');
		const current = await act('reviewer', routeId, { action: 'approve', version: 2 });
		expect(current.body).toEqual({ status: 'approved', version: 2 });
	});
});

describe('two reviewers at once', () => {
	it('lets one of two parallel approvals through and answers the other 409', async () => {
		const routeId = await routeIn('in-review');
		const answers = await Promise.all([
			act('reviewer', routeId, { action: 'approve' }),
			act('lead', routeId, { action: 'approve' })
		]);
		expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
		expect(answers.find((a) => a.status === 409)!.body.error.code).toBe('invalid_transition');
		expect(await ReviewEvent.count({ where: { routeId, action: 'approve' } })).toBe(1);
	});

	it('decides by the stored status, not the copy each request read', async () => {
		const routeId = await routeIn('in-review');
		// Both read the route while it was in review; only the conditional update may let one pass.
		const seenByBoth = await stored(routeId);
		const settled = await Promise.allSettled([
			takeReviewAction(f.people.reviewer, 'reviewer', seenByBoth, project, { action: 'approve' }),
			takeReviewAction(f.people.lead, 'lead', seenByBoth, project, {
				action: 'request-changes',
				note: 'Not yet.'
			})
		]);
		expect(settled.map((s) => s.status).sort()).toEqual(['fulfilled', 'rejected']);
		const refused = settled.find((s) => s.status === 'rejected') as PromiseRejectedResult;
		expect(refused.reason).toMatchObject({ status: 409, code: 'invalid_transition' });
		expect(await ReviewEvent.count({ where: { routeId } })).toBe(1);
	});
});

describe('approvals racing saves', () => {
	for (const withVersion of [true, false]) {
		it(`never leaves a route approved at a version nobody approved (${withVersion ? 'with' : 'without'} version)`, async () => {
			const outcomes = await approvalsAgainstSaves(f.people, project, 6, withVersion);
			for (const outcome of outcomes) {
				expect(outcome.version).toBe(2);
				if (outcome.status === 'approved') {
					expect(outcome.approvedVersion).toBe(2);
				} else {
					expect(['draft', 'in-review']).toContain(outcome.status);
				}
			}
		});
	}

	it('lets exactly one of ten verdicts from stale copies through', async () => {
		const { passed, refusals, events } = await parallelVerdicts(f.people, project, 10);
		expect(passed).toBe(1);
		expect(refusals).toEqual(Array(9).fill('invalid_transition'));
		expect(events).toBe(1);
	});

	it('answers version_conflict when a save lands between reading the route and approving it', async () => {
		const routeId = await routeIn('in-review');
		const seen = await stored(routeId);
		await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', { version: 1, document: doc() });
		const late = takeReviewAction(f.people.reviewer, 'reviewer', seen, project, {
			action: 'approve',
			version: 1
		});
		await expect(late).rejects.toMatchObject({
			status: 409,
			code: 'version_conflict',
			details: { currentVersion: 2 }
		});
		expect((await stored(routeId)).status).toBe('in-review');
	});
});

describe('an approval without a version', () => {
	it('records the version stored when it lands, not the one its copy of the route had', async () => {
		const routeId = await routeIn('in-review');
		const seen = await stored(routeId);
		await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
			version: 1,
			document: doc('Renamed meanwhile')
		});
		const answer = await takeReviewAction(f.people.reviewer, 'reviewer', seen, project, {
			action: 'approve'
		});
		expect(answer).toEqual({ status: 'approved', version: 2 });
		expect(await approvedVersionOf(routeId)).toBe(2);
		const line = await ActivityEvent.findOne({ where: { routeId, kind: 'review.approved' } });
		expect(line!.summary).toBe('Reviewer approved the route “Renamed meanwhile” (version 2).');
	});
});

describe('an edit after approval', () => {
	it('returns an approved route to draft, keeps reporting the approved version and says so in the history', async () => {
		const routeId = await routeIn('in-review');
		await act('reviewer', routeId, { action: 'approve' });
		const saved = await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
			version: 1,
			document: doc('Keto ester route, after approval')
		});
		expect(saved).toEqual({ status: 200, body: { version: 2 } });
		const got = await call(oneRoute.GET, 'reviewer', { routeId });
		expect(got.body).toMatchObject({ status: 'draft', version: 2, approvedVersion: 1 });
		// By version: two events within one millisecond would share a createdAt.
		const history = (await reviewHistory(routeId)).sort((a, b) => a.version - b.version);
		expect(history.map((e) => [e.action, e.version])).toEqual([
			['approve', 1],
			['returned-to-draft', 2]
		]);
		expect(history[1]!.actor?.id).toBe(f.people.chemist.id);
		// A second edit of the draft adds no further line.
		await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', { version: 2, document: doc() });
		expect(await ReviewEvent.count({ where: { routeId } })).toBe(2);
	});

	for (const status of ['in-review', 'changes-requested'] as const) {
		it(`keeps a ${status} route ${status} through a save`, async () => {
			const routeId = await routeIn(status);
			const saved = await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
				version: 1,
				document: doc('Edited during review')
			});
			expect(saved.status).toBe(200);
			const got = await call(oneRoute.GET, 'chemist', { routeId });
			expect(got.body.status).toBe(status);
			expect(got.body).not.toHaveProperty('approvedVersion');
			expect(await ReviewEvent.count({ where: { routeId } })).toBe(0);
		});
	}
});
