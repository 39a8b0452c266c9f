// Source of every expectation here: the issue 15 contract (who hears what on a review action,
// review history in the activity feeds), not the code under test.
import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import * as routeList from '../../src/routes/api/projects/[projectId=uuid]/routes/+server';
import * as oneRoute from '../../src/routes/api/routes/[routeId=uuid]/+server';
import * as review from '../../src/routes/api/routes/[routeId=uuid]/review/+server';
import { ActivityEvent, Membership, OutboxMessage, type Project } from '../../src/lib/server/db';
import { setCommentMails } from '../../src/lib/server/services/mail-preferences';
import { fakeEvent, freshDatabase, makeProject, makeTeamWithEveryRole } from '../factories';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
type Who = keyof typeof f.people;

const ORIGIN = 'https://orthogon.lab.example';
const originBefore = process.env.ORIGIN;

async function call(
	handler: unknown,
	who: Who,
	params: Record<string, string>,
	method: string,
	body: unknown
) {
	const event = fakeEvent({ user: f.people[who], path: '/api/x', method, body }) as RequestEvent & {
		params: Record<string, string>;
	};
	event.params = params;
	const response = await (handler as (e: RequestEvent) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

async function act(who: Who, routeId: string, body: Record<string, unknown>) {
	const answer = await call(review.POST, who, { routeId }, 'POST', body);
	expect(answer.status).toBe(200);
	return answer.body;
}

const doc = { name: 'Diol route', intermediates: [{ id: 'a', structure: 'OCCO' }], steps: [] };

/** A route written by `author`; returns its id. */
async function routeBy(author: Who = 'chemist') {
	const created = await call(routeList.POST, author, { projectId: project.id }, 'POST', doc);
	expect(created.status).toBe(201);
	return created.body.id as string;
}

const emailOf = (who: Who) => f.people[who].email;
const mailsTo = async () =>
	(await OutboxMessage.findAll({ order: [['to', 'ASC']] })).map((m) => m.get({ plain: true }));

beforeAll(async () => {
	process.env.ORIGIN = ORIGIN;
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Mail project');
});

afterAll(() => {
	process.env.ORIGIN = originBefore;
});

beforeEach(async () => {
	await OutboxMessage.destroy({ where: {} });
});

describe('review mails', () => {
	it('mails each requested reviewer once, with who asks, the note and the link', async () => {
		const routeId = await routeBy('chemist');
		await act('chemist', routeId, {
			action: 'request',
			reviewers: [emailOf('reviewer'), emailOf('lead'), emailOf('reviewer')],
			note: 'Is the ketal stable to LDA?'
		});
		const mails = await mailsTo();
		expect(mails.map((m) => m.to).sort()).toEqual([emailOf('lead'), emailOf('reviewer')].sort());
		for (const mail of mails) {
			expect(mail).toMatchObject({
				teamId: f.team.id,
				subject: 'Review requested: “Diol route”',
				status: 'queued'
			});
			expect(mail.text).toContain('Chemist asks you');
			expect(mail.text).toContain('Is the ketal stable to LDA?');
			expect(mail.text).toContain(`${ORIGIN}/routes/${routeId}`);
		}
	});

	it('tells the author and the requester of an approval, each once and never the approver', async () => {
		const routeId = await routeBy('chemist');
		await act('lead', routeId, { action: 'request', reviewers: [emailOf('reviewer')] });
		await OutboxMessage.destroy({ where: {} });
		await act('reviewer', routeId, { action: 'approve', note: 'Good to go.' });
		const mails = await mailsTo();
		expect(mails.map((m) => m.to).sort()).toEqual([emailOf('chemist'), emailOf('lead')].sort());
		for (const mail of mails) {
			expect(mail.subject).toBe('Approved: “Diol route”');
			expect(mail.text).toContain('Reviewer approved the route “Diol route” (version 1)');
			expect(mail.text).toContain('Good to go.');
			expect(mail.text).toContain(`${ORIGIN}/routes/${routeId}`);
		}
	});

	it('sends a request for changes to the author once when the author asked, and not to the acting lead', async () => {
		const routeId = await routeBy('chemist');
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('lead')] });
		await OutboxMessage.destroy({ where: {} });
		await act('lead', routeId, { action: 'request-changes', note: 'Use TBS, not TMS.' });
		const mails = await mailsTo();
		expect(mails.map((m) => m.to)).toEqual([emailOf('chemist')]);
		expect(mails[0]!.subject).toBe('Changes requested: “Diol route”');
		expect(mails[0]!.text).toContain('Use TBS, not TMS.');
	});

	it('is not affected by the comment-mail choice, and a withdrawal sends nothing', async () => {
		await setCommentMails(f.people.reviewer.id, false);
		await setCommentMails(f.people.chemist.id, false);
		const routeId = await routeBy('chemist');
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('reviewer')] });
		expect((await mailsTo()).map((m) => m.to)).toEqual([emailOf('reviewer')]);
		await act('chemist', routeId, { action: 'withdraw' });
		expect(await OutboxMessage.count()).toBe(1);
		await setCommentMails(f.people.reviewer.id, true);
		await setCommentMails(f.people.chemist.id, true);
	});

	it('writes no mail when the action is refused', async () => {
		const routeId = await routeBy('chemist');
		const refused = await call(review.POST, 'chemist', { routeId }, 'POST', { action: 'approve' });
		expect(refused.status).toBe(403);
		const wrongStatus = await call(review.POST, 'reviewer', { routeId }, 'POST', {
			action: 'approve'
		});
		expect(wrongStatus.status).toBe(409);
		expect(await OutboxMessage.count()).toBe(0);
	});

	it('does not mail an author who has left the team', async () => {
		const routeId = await routeBy('lead');
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('reviewer')] });
		await OutboxMessage.destroy({ where: {} });
		const leadMembership = await Membership.findOne({
			where: { userId: f.people.lead.id, teamId: f.team.id }
		});
		await leadMembership!.destroy();
		try {
			await act('reviewer', routeId, { action: 'approve' });
			expect((await mailsTo()).map((m) => m.to)).toEqual([emailOf('chemist')]);
		} finally {
			await Membership.create({ userId: f.people.lead.id, teamId: f.team.id, role: 'lead' });
		}
	});
});

describe('review activity', () => {
	it('records each action and the return to draft with route, project, people and note', async () => {
		const routeId = await routeBy('chemist');
		await act('chemist', routeId, {
			action: 'request',
			reviewers: [emailOf('reviewer'), emailOf('lead')],
			note: 'First look, please.'
		});
		await act('reviewer', routeId, { action: 'request-changes', note: 'Protect the amine.' });
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('reviewer')] });
		await act('reviewer', routeId, { action: 'approve' });
		const saved = await call(oneRoute.PUT, 'chemist', { routeId }, 'PUT', {
			version: 1,
			document: doc
		});
		expect(saved.status).toBe(200);
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('lead')] });
		await act('chemist', routeId, { action: 'withdraw' });
		const events = await ActivityEvent.findAll({ where: { routeId } });
		const rows = events
			.filter((e) => e.kind.startsWith('review.'))
			.map((e) => ({ kind: e.kind, projectId: e.projectId, summary: e.summary }));
		// Compared as a set: two lines written within one millisecond share a createdAt.
		const expected = [
			[
				'review.requested',
				'Chemist asked Reviewer and Lead to review the route “Diol route” (version 1): “First look, please.”'
			],
			[
				'review.changes-requested',
				'Reviewer asked for changes to the route “Diol route” (version 1): “Protect the amine.”'
			],
			['review.requested', 'Chemist asked Reviewer to review the route “Diol route” (version 1).'],
			['review.approved', 'Reviewer approved the route “Diol route” (version 1).'],
			[
				'review.returned-to-draft',
				'Chemist’s edit returned the route “Diol route” to draft: version 1 was approved, version 2 is not yet reviewed.'
			],
			['review.requested', 'Chemist asked Lead to review the route “Diol route” (version 2).'],
			['review.withdrawn', 'Chemist withdrew the route “Diol route” (version 2) from review.']
		].map(([kind, summary]) => ({ kind, projectId: project.id, summary }));
		expect(rows).toHaveLength(expected.length);
		expect(rows).toEqual(expect.arrayContaining(expected));
	});

	it('quotes a long note only as far as the activity line holds', async () => {
		const routeId = await routeBy('chemist');
		await act('chemist', routeId, { action: 'request', reviewers: [emailOf('reviewer')] });
		await act('reviewer', routeId, { action: 'request-changes', note: 'x'.repeat(2000) });
		const line = await ActivityEvent.findOne({
			where: { routeId, kind: 'review.changes-requested' }
		});
		expect(line!.summary.length).toBeLessThanOrEqual(500);
		expect(line!.summary).toMatch(/^Reviewer asked for changes .*: “x+…”$/);
	});
});
