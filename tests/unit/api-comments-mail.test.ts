import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import * as routeComments from '../../src/routes/api/routes/[routeId=uuid]/comments/+server';
import * as oneComment from '../../src/routes/api/comments/[commentId=uuid]/+server';
import {
	ActivityEvent,
	Comment,
	OutboxMessage,
	type Project,
	type Route
} from '../../src/lib/server/db';
import { setCommentMails } from '../../src/lib/server/services/mail-preferences';
import { createRoute } from '../../src/lib/server/services/routes';
import type { SessionUser } from '../../src/lib/types';
import {
	callApi,
	freshDatabase,
	join,
	makeProject,
	makeTeamWithEveryRole,
	makeUser
} from '../factories';

// Who hears about a new comment, what the activity feed records, and that a comment, its event and
// its mails commit together or not at all. Source of truth: issue 15 ("Who hears what": the
// route's author and the thread's earlier participants on a new comment, never the comment's own
// author; anyone @mentioned; comment mails can be turned off; the change and its messages are
// written in one transaction).

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Project;
let route: Route;
let quiet: SessionUser;

const ORIGIN = 'https://orthogon.lab.example';
const document = {
	name: 'Ketoester route',
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC1(CCC(=O)OC)OCCO1' }
	],
	steps: [{ id: 'ketal', from: ['a'], to: 'b', reagents: 'ethylene glycol, TsOH, toluene' }]
};

const post = (user: SessionUser, body: unknown) =>
	callApi(routeComments.POST, { user, method: 'POST', body, params: { routeId: route.id } });
const patch = (user: SessionUser, commentId: string, body: unknown) =>
	callApi(oneComment.PATCH, { user, method: 'PATCH', body, params: { commentId } });

/** The outbox rows that `run` adds, by recipient. */
async function mailsFrom(run: () => Promise<unknown>): Promise<OutboxMessage[]> {
	const before = new Set((await OutboxMessage.findAll({ attributes: ['id'] })).map((m) => m.id));
	await run();
	const after = await OutboxMessage.findAll({ order: [['to', 'ASC']] });
	return after.filter((mail) => !before.has(mail.id));
}

beforeAll(async () => {
	vi.stubEnv('ORIGIN', ORIGIN);
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	quiet = await makeUser('Quinn Quiet');
	await join(quiet, f.team.id, 'chemist');
	await setCommentMails(quiet.id, false);
	project = await makeProject(f.team.id, 'Ketal project');
	route = await createRoute(f.people.chemist, project, document);
});

afterEach(() => {
	vi.restoreAllMocks();
});

describe('comment mails', () => {
	const to = (mails: OutboxMessage[]) => mails.map((mail) => mail.to).sort();
	const emails = (...people: SessionUser[]) => people.map((person) => person.email).sort();

	it('tells the route’s author about a reviewer’s step comment, with the step link', async () => {
		const mails = await mailsFrom(() =>
			post(f.people.reviewer, { body: 'Is **TsOH** enough?', stepId: 'ketal' })
		);
		expect(to(mails)).toEqual(emails(f.people.chemist));
		const [mail] = mails;
		expect(mail).toMatchObject({ teamId: f.team.id, status: 'queued', attempts: 0 });
		expect(mail!.subject).toBe(
			'New comment on “Ketoester route” — step "ketal" (ethylene glycol, TsOH, toluene)'
		);
		expect(mail!.text).toContain('Reviewer commented on step "ketal"');
		expect(mail!.text).toContain('Is **TsOH** enough?');
		expect(mail!.text).toContain(`${ORIGIN}/routes/${route.id}?step=ketal`);
	});

	it('tells the thread’s earlier participants and the author, never the writer, each once', async () => {
		const byLead = await mailsFrom(() =>
			post(f.people.lead, { body: 'Dean–Stark, then.', stepId: 'ketal' })
		);
		expect(to(byLead)).toEqual(emails(f.people.chemist, f.people.reviewer));
		// The route's author answers, mentioning herself: the two earlier participants hear, she does not.
		const byAuthor = await mailsFrom(() =>
			post(f.people.chemist, { body: 'Yes, **Dean–Stark**, @Chemist', stepId: 'ketal' })
		);
		expect(to(byAuthor)).toEqual(emails(f.people.lead, f.people.reviewer));
	});

	it('keeps threads apart: a route comment does not tell a step thread’s participants', async () => {
		const mails = await mailsFrom(() => post(f.people.lead, { body: 'Overall fine.' }));
		expect(to(mails)).toEqual(emails(f.people.chemist));
		expect(mails[0]!.subject).toBe('New comment on “Ketoester route”');
		expect(mails[0]!.text).toContain(`${ORIGIN}/routes/${route.id}\n`);
	});

	it('tells a mentioned teammate with their own subject; not an outsider, not a quiet one', async () => {
		const mails = await mailsFrom(() =>
			post(f.people.lead, { body: '@Viewer please read; cc @Outsider, @Quinn Quiet and @Chemist' })
		);
		expect(to(mails)).toEqual(emails(f.people.chemist, f.people.viewer));
		for (const mail of mails) {
			expect(mail.subject).toBe('Lead mentioned you on “Ketoester route”');
			expect(mail.text).toContain('You get this mail because you were mentioned.');
		}
	});

	it('tells a quiet route author nothing, and a mention in code nobody', async () => {
		const quietRoute = await createRoute(quiet, project, { ...document, name: 'Quiet route' });
		const mails = await mailsFrom(() =>
			callApi(routeComments.POST, {
				user: f.people.lead,
				method: 'POST',
				body: { body: 'Run `notify @Viewer` later.' },
				params: { routeId: quietRoute.id }
			})
		);
		expect(mails).toEqual([]);
	});
});

describe('comment activity', () => {
	it('records added, edited, resolved and reopened with the route and project', async () => {
		const { body } = await post(f.people.reviewer, { body: 'Water?', stepId: 'ketal' });
		await patch(f.people.reviewer, body.id, { body: 'Water removal?' });
		await patch(f.people.chemist, body.id, { resolved: true });
		await patch(f.people.lead, body.id, { resolved: false });
		const events = await ActivityEvent.findAll({
			where: { routeId: route.id },
			order: [['createdAt', 'ASC']]
		});
		const mine = events.filter((e) => (e.details as { commentId?: string })?.commentId === body.id);
		expect(mine.map((e) => [e.kind, e.summary])).toEqual([
			[
				'comment.added',
				'Reviewer commented on step "ketal" (ethylene glycol, TsOH, toluene) of “Ketoester route”.'
			],
			[
				'comment.edited',
				'Reviewer edited a comment on step "ketal" (ethylene glycol, TsOH, toluene) of “Ketoester route”.'
			],
			[
				'comment.resolved',
				'Chemist resolved a comment on step "ketal" (ethylene glycol, TsOH, toluene) of “Ketoester route”.'
			],
			[
				'comment.reopened',
				'Lead reopened a comment on step "ketal" (ethylene glycol, TsOH, toluene) of “Ketoester route”.'
			]
		]);
		for (const event of mine) {
			expect(event).toMatchObject({ teamId: f.team.id, projectId: project.id });
		}
	});
});

describe('all or nothing', () => {
	const counts = async () => [
		await Comment.count(),
		await ActivityEvent.count(),
		await OutboxMessage.count()
	];

	it('writes no comment and no event when queuing its mail fails (500, no stack trace)', async () => {
		const before = await counts();
		vi.spyOn(console, 'error').mockImplementation(() => undefined);
		vi.spyOn(OutboxMessage, 'bulkCreate').mockRejectedValueOnce(new Error('disk full at /var/lib'));
		const answer = await post(f.people.reviewer, { body: 'Lost?', stepId: 'ketal' });
		expect(answer.status).toBe(500);
		expect(JSON.stringify(answer.body)).not.toContain('/var/lib');
		expect(await counts()).toEqual(before);
	});

	it('keeps the comment unchanged when recording its edit fails', async () => {
		const { body } = await post(f.people.reviewer, { body: 'Original', stepId: 'ketal' });
		vi.spyOn(console, 'error').mockImplementation(() => undefined);
		vi.spyOn(ActivityEvent, 'create').mockRejectedValueOnce(new Error('constraint'));
		const answer = await patch(f.people.reviewer, body.id, { body: 'Changed', resolved: true });
		expect(answer.status).toBe(500);
		expect(await Comment.findByPk(body.id)).toMatchObject({
			body: 'Original',
			resolved: false,
			editedAt: null
		});
	});

	it('writes nothing for a refused comment (422, 403)', async () => {
		const before = await counts();
		expect((await post(f.people.lead, { body: 'x', stepId: 'nope' })).status).toBe(422);
		expect((await post(f.people.viewer, { body: 'x' })).status).toBe(403);
		expect(await counts()).toEqual(before);
	});
});
