import { isHttpError } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { load } from '../../src/routes/outbox/+page.server';
import { GET } from '../../src/routes/api/outbox/+server';
import { OutboxMessage, ReceivedMail } from '../../src/lib/server/db';
import type { OutboxAnswer } from '../../src/lib/api/answers';
import {
	fakeEvent,
	freshDatabase,
	join,
	makeTeam,
	makeTeamWithEveryRole,
	makeUser
} from '../factories';
import { queueSome } from '../factories/mail';
import { outboxMessageId } from '../../src/lib/server/mail/outbox';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	await queueSome(f.team.id, 2, 'Ours');
	await queueSome(f.other.id, 1, 'Theirs');
	// One of ours already went out, after two tries.
	const [first] = await OutboxMessage.findAll({ where: { subject: 'Ours 0' } });
	await first!.update({ status: 'sent', attempts: 2, sentAt: new Date('2026-12-04T05:00:00Z') });
});

const call = async (user: Parameters<typeof fakeEvent>[0]['user']) => {
	const response = await (GET as (event: never) => Promise<Response>)(
		fakeEvent({ user, path: '/api/outbox' }) as never
	);
	return { status: response.status, body: await response.json() };
};

describe('GET /api/outbox', () => {
	it('gives a lead their team’s messages, newest first, in exactly the OutboxAnswer shape', async () => {
		// Created a moment apart, so "newest first" has an order to show.
		const [later] = await OutboxMessage.findAll({ where: { subject: 'Ours 1' } });
		await OutboxMessage.update(
			{ createdAt: new Date(Date.now() + 60_000) },
			{ where: { id: later!.id }, silent: true }
		);
		const { status, body } = await call(f.people.lead);
		expect(status).toBe(200);
		const answer = body as OutboxAnswer;
		expect(Object.keys(answer)).toEqual(['messages']);
		expect(answer.messages.map((m) => m.subject)).toEqual(['Ours 1', 'Ours 0']);
		expect(answer.messages[1]).toEqual({
			id: expect.any(String),
			to: 'person0@lab.example',
			subject: 'Ours 0',
			text: 'Body of Ours 0.\nSee http://localhost/routes/1',
			status: 'sent',
			attempts: 2,
			lastError: null,
			createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT.*Z$/),
			sentAt: '2026-12-04T05:00:00.000Z'
		});
		expect(answer.messages[0]).toMatchObject({ status: 'queued', attempts: 0, sentAt: null });
	});

	it('never shows another team’s messages', async () => {
		const ours = await call(f.people.lead);
		expect(ours.body.messages.some((m: { subject: string }) => m.subject === 'Theirs 0')).toBe(
			false
		);
		const theirs = await call(f.people.outsider);
		expect(theirs.body.messages.map((m: { subject: string }) => m.subject)).toEqual(['Theirs 0']);
	});

	it('shows a lead of two teams both, and only those they lead', async () => {
		const both = await makeUser('Double lead');
		await join(both, f.team.id, 'lead');
		await join(both, f.other.id, 'lead');
		const reader = await makeUser('Lead here, chemist there');
		const third = await makeTeam('Third team');
		await queueSome(third.id, 1, 'Third');
		await join(reader, third.id, 'lead');
		await join(reader, f.team.id, 'chemist');
		const subjects = async (user: typeof both) =>
			(await call(user)).body.messages.map((m: { subject: string }) => m.subject).sort();
		expect(await subjects(both)).toEqual(['Ours 0', 'Ours 1', 'Theirs 0']);
		expect(await subjects(reader)).toEqual(['Third 0']);
	});

	it('refuses chemists, reviewers, viewers and people who lead no team with 403', async () => {
		const nobody = await makeUser('In no team');
		for (const user of [f.people.chemist, f.people.reviewer, f.people.viewer, nobody]) {
			expect(await call(user)).toEqual({
				status: 403,
				body: { error: { code: 'forbidden', message: 'Only a team lead can read the outbox.' } }
			});
		}
	});

	it('answers 401 without a user', async () => {
		expect((await call(null)).status).toBe(401);
	});
});

describe('the Outbox page', () => {
	const open = (user: Parameters<typeof fakeEvent>[0]['user']) =>
		(load as (event: never) => Promise<Record<string, unknown>>)(
			fakeEvent({ user, path: '/outbox' }) as never
		);

	it('shows a lead the messages and the catcher’s copies of those messages only', async () => {
		const [ours] = await OutboxMessage.findAll({ where: { subject: 'Ours 1' } });
		const [theirs] = await OutboxMessage.findAll({ where: { subject: 'Theirs 0' } });
		const received = (outboxId: string, subject: string) =>
			ReceivedMail.create({
				messageId: outboxMessageId(outboxId),
				from: 'Orthogon <orthogon@localhost>',
				// Our reviewer, who (say) is in the other team too: its mail must still not show.
				to: `"Reviewer" <${f.people.reviewer.email}>`,
				subject,
				text: 'Hello',
				receivedAt: new Date()
			});
		await received(ours!.id, 'Ours 1');
		await received(theirs!.id, 'Theirs 0');
		const page = await open(f.people.lead);
		expect(page.teamNames).toEqual(['Bench team']);
		expect((page.messages as { subject: string }[]).map((m) => m.subject).sort()).toEqual([
			'Ours 0',
			'Ours 1'
		]);
		expect(page.received).toEqual([expect.objectContaining({ subject: 'Ours 1', text: 'Hello' })]);
	});

	it('is a 403 page for a chemist', async () => {
		const refused = await open(f.people.chemist).catch((caught: unknown) => caught);
		expect(isHttpError(refused) && refused.status).toBe(403);
	});
});
