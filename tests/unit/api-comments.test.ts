import { beforeAll, describe, expect, it } from 'vitest';
import * as routeComments from '../../src/routes/api/routes/[routeId=uuid]/comments/+server';
import * as oneComment from '../../src/routes/api/comments/[commentId=uuid]/+server';
import { Comment, type Route } from '../../src/lib/server/db';
import { createRoute } from '../../src/lib/server/services/routes';
import { openCommentCounts } from '../../src/lib/server/services/comments';
import { callApi, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

// The comment endpoints against the issue 15 contract: `POST /api/routes/{id}/comments` (lead,
// chemist, reviewer; viewer 403; another team 404; unknown step 422), `GET` (every role) with the
// listing shape, and `PATCH /api/comments/{id}` (body by its author only, resolving by any role
// that may comment, viewer 403, another team 404). Mails and activity: api-comments-mail.test.ts.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let route: Route;
let otherRoute: Route;

const document = (name: string) => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'OCCCCO' },
		{ id: 'b', structure: 'CC(C)(C)[Si](C)(C)OCCCCO' },
		{ id: 'c', structure: 'CC(C)(C)[Si](C)(C)OCCCC=O' }
	],
	steps: [
		{ id: 's1', from: ['a'], to: 'b', reagents: 'TBSCl, imidazole, DMF' },
		{ id: 's2', from: ['b'], to: 'c', reagents: 'PCC, CH2Cl2' }
	]
});

type Who = keyof typeof f.people;
const as = (who: Who) => f.people[who];
const post = (who: Who, body: unknown, routeId = route.id) =>
	callApi(routeComments.POST, { user: as(who), method: 'POST', body, params: { routeId } });
const list = (who: Who, routeId = route.id) =>
	callApi(routeComments.GET, { user: as(who), method: 'GET', params: { routeId } });
const patch = (who: Who, commentId: string, body: unknown) =>
	callApi(oneComment.PATCH, { user: as(who), method: 'PATCH', body, params: { commentId } });

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	const project = await makeProject(f.team.id, 'Diol project');
	route = await createRoute(f.people.chemist, project, document('Butanediol route'));
	const otherProject = await makeProject(f.team.id, 'Second project');
	otherRoute = await createRoute(f.people.lead, otherProject, document('Second route'));
});

describe('comments API: who may list and add', () => {
	it('lists for every role of the team (an empty list at first), 404 for another team', async () => {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			expect(await list(who)).toEqual({ status: 200, body: { comments: [] } });
		}
		const outsider = await list('outsider');
		expect(outsider.status).toBe(404);
		expect(outsider.body.error.code).toBe('not_found');
	});

	it('lets a lead, a chemist and a reviewer comment (201 { id }); viewer 403; another team 404', async () => {
		for (const who of ['lead', 'chemist', 'reviewer'] as const) {
			const created = await post(who, { body: `From the ${who}` });
			expect(created).toEqual({ status: 201, body: { id: expect.any(String) } });
		}
		const viewer = await post('viewer', { body: 'Can I?' });
		expect(viewer.status).toBe(403);
		expect(viewer.body.error.code).toBe('forbidden');
		const outsider = await post('outsider', { body: 'Hello from elsewhere' });
		expect(outsider.status).toBe(404);
		expect(await Comment.count({ where: { routeId: route.id } })).toBe(3);
	});

	it('refuses an empty body, or one with a NUL, with 400 and writes nothing', async () => {
		const before = await Comment.count();
		const empty = await post('chemist', { body: '   ' });
		expect(empty.status).toBe(400);
		expect(empty.body.error.code).toBe('invalid_body');
		// PostgreSQL refuses NUL in text; the body must be refused before it gets there.
		const nul = await post('chemist', { body: 'TBS\u0000Cl' });
		expect(nul.status).toBe(400);
		expect(JSON.stringify(nul.body.error.details)).toContain('control characters');
		expect(await Comment.count()).toBe(before);
	});
});

describe('comments API: steps and replies', () => {
	it('returns the listing in the contract’s shape, Markdown rendered, oldest first', async () => {
		const created = await post('reviewer', { body: 'Is **TBS** safe to *PCC*?', stepId: 's2' });
		const { body } = await list('viewer');
		const last = body.comments.at(-1);
		expect(last).toEqual({
			id: created.body.id,
			stepId: 's2',
			replyTo: null,
			author: { id: f.people.reviewer.id, name: 'Reviewer' },
			body: 'Is **TBS** safe to *PCC*?',
			html: '<p>Is <strong>TBS</strong> safe to <em>PCC</em>?</p>',
			resolved: false,
			createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
			editedAt: null
		});
		const times = body.comments.map((c: { createdAt: string }) => c.createdAt);
		expect([...times].sort()).toEqual(times);
	});

	it('refuses a step the route does not have with 422 unknown_step, naming it', async () => {
		const before = await Comment.count();
		const answer = await post('chemist', { body: 'Here?', stepId: 's9' });
		expect(answer.status).toBe(422);
		expect(answer.body.error.code).toBe('unknown_step');
		expect(answer.body.error.message).toContain('s9');
		expect(answer.body.error.message).toContain('Butanediol route');
		expect(await Comment.count()).toBe(before);
	});

	it('threads a reply under the step of the comment it answers', async () => {
		const question = await post('reviewer', { body: 'Why DMF?', stepId: 's1' });
		const reply = await post('chemist', {
			body: 'Imidazole dissolves.',
			replyTo: question.body.id
		});
		expect(reply.status).toBe(201);
		const same = await post('lead', { body: 'Agreed.', replyTo: question.body.id, stepId: 's1' });
		expect(same.status).toBe(201);
		const { body } = await list('chemist');
		const stored = body.comments.find((c: { id: string }) => c.id === reply.body.id);
		expect(stored).toMatchObject({ stepId: 's1', replyTo: question.body.id });
	});

	it('refuses a reply that names another step, or a comment not on this route (422)', async () => {
		const question = await post('reviewer', { body: 'Yield?', stepId: 's1' });
		const elsewhere = await post('chemist', { body: 'x', replyTo: question.body.id, stepId: 's2' });
		expect(elsewhere.status).toBe(422);
		expect(elsewhere.body.error.code).toBe('unknown_step');
		const foreign = await post('lead', { body: 'On the second route' }, otherRoute.id);
		const crossRoute = await post('chemist', { body: 'x', replyTo: foreign.body.id });
		expect(crossRoute.status).toBe(422);
		expect(crossRoute.body.error.code).toBe('unknown_comment');
		const missing = await post('chemist', {
			body: 'x',
			replyTo: '00000000-0000-4000-8000-000000000000'
		});
		expect(missing.status).toBe(422);
		expect(missing.body.error.code).toBe('unknown_comment');
	});
});

describe('comments API: editing, resolving, reopening', () => {
	let commentId = '';
	beforeAll(async () => {
		commentId = (await post('chemist', { body: 'TBS first, then oxidise.', stepId: 's1' })).body.id;
	});

	it('lets the author edit the body: 200 with the comment, marked edited', async () => {
		const edited = await patch('chemist', commentId, { body: 'TBS first, then **PCC**.' });
		expect(edited.status).toBe(200);
		expect(edited.body).toMatchObject({
			id: commentId,
			body: 'TBS first, then **PCC**.',
			html: '<p>TBS first, then <strong>PCC</strong>.</p>',
			editedAt: expect.any(String),
			resolved: false
		});
		const { body } = await list('viewer');
		expect(body.comments.find((c: { id: string }) => c.id === commentId)).toEqual(edited.body);
	});

	it('refuses a body edit by anyone but the author (403), even a lead, and changes nothing', async () => {
		for (const who of ['lead', 'reviewer'] as const) {
			const answer = await patch(who, commentId, { body: 'Rewritten', resolved: true });
			expect(answer.status).toBe(403);
			expect(answer.body.error.code).toBe('forbidden');
		}
		const stored = await Comment.findByPk(commentId);
		expect(stored).toMatchObject({ body: 'TBS first, then **PCC**.', resolved: false });
	});

	it('lets a reviewer resolve and the author reopen, without marking it edited', async () => {
		const fresh = (await post('lead', { body: 'Check the PCC workup.' })).body.id;
		const resolved = await patch('reviewer', fresh, { resolved: true });
		expect(resolved.status).toBe(200);
		expect(resolved.body).toMatchObject({ resolved: true, editedAt: null });
		const reopened = await patch('lead', fresh, { resolved: false });
		expect(reopened.body).toMatchObject({ resolved: false, editedAt: null });
		const byChemist = await patch('chemist', fresh, { resolved: true });
		expect(byChemist.body.resolved).toBe(true);
	});

	it('refuses a viewer (403) and another team (404), and an unknown comment is 404', async () => {
		const viewer = await patch('viewer', commentId, { resolved: true });
		expect(viewer.status).toBe(403);
		const outsider = await patch('outsider', commentId, { resolved: true });
		expect(outsider.status).toBe(404);
		expect(outsider.body.error.code).toBe('not_found');
		const missing = await patch('lead', '00000000-0000-4000-8000-000000000000', {
			resolved: true
		});
		expect(missing.status).toBe(404);
		expect((await Comment.findByPk(commentId))!.resolved).toBe(false);
	});

	it('refuses a patch with neither field (400)', async () => {
		const answer = await patch('chemist', commentId, {});
		expect(answer.status).toBe(400);
		expect(answer.body.error.code).toBe('invalid_body');
	});
});

describe('open comments per route (the project table) follow the route page rule', () => {
	it('counts unresolved comments of threads whose first comment is unresolved', async () => {
		const project = await makeProject(f.team.id, 'Counting project');
		const counted = await createRoute(f.people.chemist, project, document('Counted route'));
		const open = (await post('reviewer', { body: 'Why TBS?', stepId: 's1' }, counted.id)).body.id;
		await post('chemist', { body: 'It survives PCC.', replyTo: open }, counted.id);
		const closed = (await post('reviewer', { body: 'Typo in s2', stepId: 's2' }, counted.id)).body
			.id;
		await post('chemist', { body: 'Fixed.', replyTo: closed }, counted.id);
		expect((await patch('reviewer', closed, { resolved: true })).status).toBe(200);
		// Two open on s1; the s2 thread is resolved at its first comment, so its reply folds away
		// with it on the route page and is not counted here either.
		const quiet = await createRoute(f.people.chemist, project, document('Quiet route'));
		const counts = await openCommentCounts([counted.id, quiet.id]);
		expect(counts).toEqual({ [counted.id]: 2 });
	});
});
