import { randomBytes } from 'node:crypto';
import net from 'node:net';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { closeDatabase, dbReady, openDatabase, ReceivedMail } from '../../src/lib/server/db';
import { createSequelize } from '../../src/lib/server/db/connection';
import { mailConfig } from '../../src/lib/server/mail/config';
import { startFakeSmtp } from '../../src/lib/server/mail/fake-smtp';
import { mailQueued } from '../../src/lib/server/mail/outbox';
import { MailSender } from '../../src/lib/server/mail/sender';
import { freshDatabase, makeTeam } from '../factories';
import { outboxRows, queueSome, startCatcher, TestClock, unusedPort } from '../factories/mail';

// Every case talks real SMTP over 127.0.0.1 to an smtp-server on a port of its own; time moves
// by an injected clock, so backoff is stepped through without sleeping.
const BACKOFF = 10_000;
const settings = (port: number) =>
	mailConfig({
		fakePort: port,
		maxAttempts: 3,
		backoffBaseMs: BACKOFF,
		claimLeaseMs: 60_000,
		sendTimeoutMs: 5_000,
		batchSize: 4
	});

const senders: MailSender[] = [];
function sender(port: number, clock: TestClock, id?: string) {
	const made = new MailSender(settings(port), { now: clock.now, id });
	senders.push(made);
	return made;
}

let teamId: string;
beforeEach(async () => {
	await freshDatabase();
	teamId = (await makeTeam()).id;
});
afterAll(async () => {
	await Promise.all(senders.map((s) => s.stop()));
});

describe('the outbox sender', () => {
	it('delivers over SMTP to the local fake, which keeps the parsed mail; the row is sent', async () => {
		const fake = (await startFakeSmtp(0))!;
		try {
			await queueSome(teamId, 1, 'Review requested');
			const clock = new TestClock();
			expect(await sender(fake.port, clock).deliverDue()).toMatchObject({ sent: 1 });
			const [row] = await outboxRows();
			expect(row).toMatchObject({ status: 'sent', attempts: 1, lastError: null });
			expect(row!.sentAt?.getTime()).toBe(clock.now().getTime());
			const [mail] = await ReceivedMail.findAll();
			expect(mail).toMatchObject({
				messageId: `<${row!.id}@orthogon>`,
				from: '"Orthogon" <orthogon@localhost>',
				to: 'person0@lab.example',
				subject: 'Review requested 0'
			});
			expect(mail!.text).toContain('See http://localhost/routes/1');
		} finally {
			await fake.close();
		}
	});

	it('retries a relay that refuses, waiting base then twice base, then delivers', async () => {
		const relay = await startCatcher({ refuse: 2 });
		try {
			await queueSome(teamId, 1);
			const clock = new TestClock();
			const mailer = sender(relay.port, clock);
			expect(await mailer.deliverDue()).toMatchObject({ retried: 1 });
			let [row] = await outboxRows();
			expect(row).toMatchObject({ status: 'queued', attempts: 1 });
			expect(row!.lastError).toMatch(/451 Mailbox busy/);
			expect(row!.nextAttemptAt.getTime()).toBe(clock.now().getTime() + BACKOFF);
			// Not due before its time: nothing is tried.
			clock.advance(BACKOFF - 1);
			expect(await mailer.deliverDue()).toMatchObject({ sent: 0, retried: 0 });
			clock.advance(1);
			expect(await mailer.deliverDue()).toMatchObject({ retried: 1 });
			[row] = await outboxRows();
			expect(row!.nextAttemptAt.getTime()).toBe(clock.now().getTime() + 2 * BACKOFF);
			clock.advance(2 * BACKOFF);
			expect(await mailer.deliverDue()).toMatchObject({ sent: 1 });
			[row] = await outboxRows();
			expect(row).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
			expect(relay.refusals()).toBe(2);
			expect(relay.received).toHaveLength(1);
		} finally {
			await relay.close();
		}
	});

	it('marks a message failed, with the relay’s answer, after the last try', async () => {
		const relay = await startCatcher({ refuse: 99 });
		try {
			await queueSome(teamId, 1);
			const clock = new TestClock();
			const mailer = sender(relay.port, clock);
			for (let attempt = 0; attempt < 3; attempt += 1) {
				await mailer.deliverDue();
				clock.advance(10 * BACKOFF);
			}
			const [row] = await outboxRows();
			expect(row).toMatchObject({ status: 'failed', attempts: 3 });
			expect(row!.lastError).toMatch(/451 Mailbox busy/);
			// Failed is final: no fourth try.
			expect(await mailer.deliverDue()).toMatchObject({ sent: 0, retried: 0, failed: 0 });
			expect(relay.refusals()).toBe(3);
		} finally {
			await relay.close();
		}
	});

	it('loses nothing while no mail server listens at all, and delivers once one starts', async () => {
		const port = await unusedPort();
		await queueSome(teamId, 2);
		const clock = new TestClock();
		const mailer = sender(port, clock);
		await mailer.deliverDue();
		clock.advance(BACKOFF);
		await mailer.deliverDue();
		for (const row of await outboxRows()) {
			expect(row).toMatchObject({ status: 'queued', attempts: 2 });
			expect(row.lastError).toMatch(/ECONNREFUSED/);
		}
		const relay = await startCatcher({ port });
		try {
			clock.advance(2 * BACKOFF);
			expect(await mailer.deliverDue()).toMatchObject({ sent: 2 });
			expect((await outboxRows()).map((r) => r.status)).toEqual(['sent', 'sent']);
			expect(relay.received.map((m) => m.subject).sort()).toEqual(['Note 0', 'Note 1']);
		} finally {
			await relay.close();
		}
	});

	it('two senders on one database deliver each message exactly once', async () => {
		const relay = await startCatcher();
		try {
			await twoSendersDeliverExactlyOnce(teamId, relay);
		} finally {
			await relay.close();
		}
	});

	it('re-claims a message left sending by a sender that died, once its lease has ended', async () => {
		const relay = await startCatcher();
		try {
			await queueSome(teamId, 2);
			const clock = new TestClock();
			const [stale, held] = await outboxRows();
			const claim = { status: 'sending' as const, claimedBy: 'dead-sender', attempts: 1 };
			await stale!.update({ ...claim, nextAttemptAt: new Date(clock.now().getTime() - 1) });
			await held!.update({ ...claim, nextAttemptAt: new Date(clock.now().getTime() + 30_000) });
			const mailer = sender(relay.port, clock, 'live-sender');
			expect(await mailer.deliverDue()).toMatchObject({ sent: 1 });
			await stale!.reload();
			await held!.reload();
			expect(stale).toMatchObject({ status: 'sent', claimedBy: 'live-sender', attempts: 2 });
			expect(held).toMatchObject({ status: 'sending', claimedBy: 'dead-sender', attempts: 1 });
			expect(relay.received.map((m) => m.subject)).toEqual([stale!.subject]);
		} finally {
			await relay.close();
		}
	});

	it('does not resend a last try that was interrupted; it says the outcome is unknown', async () => {
		const relay = await startCatcher();
		try {
			await queueSome(teamId, 1);
			const clock = new TestClock();
			const [row] = await outboxRows();
			await row!.update({
				status: 'sending',
				claimedBy: 'dead-sender',
				attempts: 3,
				nextAttemptAt: new Date(clock.now().getTime() - 1)
			});
			expect(await sender(relay.port, clock).deliverDue()).toMatchObject({ failed: 1 });
			await row!.reload();
			expect(row!.status).toBe('failed');
			expect(row!.lastError).toMatch(/interrupted.*may or may not have been delivered/);
			expect(relay.received).toHaveLength(0);
		} finally {
			await relay.close();
		}
	});
});

/**
 * Both senders read the same first batch at once and race for every claim in it; the count of
 * what the relay received shows that each message still left once.
 */
async function twoSendersDeliverExactlyOnce(
	teamId: string,
	relay: Awaited<ReturnType<typeof startCatcher>>
) {
	await queueSome(teamId, 12);
	const clock = new TestClock();
	const rounds = await Promise.all([
		sender(relay.port, clock, 'sender-a').deliverDue(),
		sender(relay.port, clock, 'sender-b').deliverDue()
	]);
	expect(rounds[0]!.sent + rounds[1]!.sent).toBe(12);
	expect(rounds[0]!.lostClaims + rounds[1]!.lostClaims).toBeGreaterThan(0);
	expect(relay.received).toHaveLength(12);
	expect(new Set(relay.received.map((m) => m.messageId)).size).toBe(12);
	const rows = await outboxRows();
	expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
}

describe('the sender loop and the request path', () => {
	it('a request that queues mail commits and returns with no mail server listening', async () => {
		const port = await unusedPort();
		const mailer = new MailSender(settings(port));
		senders.push(mailer);
		mailer.start();
		const woken = vi.fn();
		mailQueued.on('queued', woken);
		await queueSome(teamId, 3);
		mailQueued.off('queued', woken);
		// The rows are committed and the wake-up sent; no SMTP happened on the request's path.
		expect(woken).toHaveBeenCalledTimes(1);
		expect((await outboxRows()).map((r) => r.subject)).toEqual(['Note 0', 'Note 1', 'Note 2']);
		await mailer.stop();
	});

	it('a running sender wakes on mailQueued rather than waiting for its next poll', async () => {
		const relay = await startCatcher();
		const mailer = new MailSender({ ...settings(relay.port), pollIntervalMs: 600_000 });
		senders.push(mailer);
		try {
			mailer.start();
			await vi.waitFor(() => expect(mailer.isIdle()).toBe(true));
			await queueSome(teamId, 1);
			await vi.waitFor(async () => expect((await outboxRows())[0]!.status).toBe('sent'), {
				timeout: 5_000
			});
			expect(relay.received).toHaveLength(1);
		} finally {
			await mailer.stop();
			await relay.close();
		}
	});

	it('the local fake says plainly when its port is taken, and the app goes on', async () => {
		const squatter = net.createServer();
		await new Promise<void>((resolve) => squatter.listen(0, '127.0.0.1', resolve));
		const { port } = squatter.address() as net.AddressInfo;
		const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
		try {
			expect(await startFakeSmtp(port)).toBeNull();
			expect(warn).toHaveBeenCalledWith(
				`[mail] port ${port} is in use; mail stays queued until something listens there; set SMTP_FAKE_PORT or SMTP_URL`
			);
		} finally {
			warn.mockRestore();
			await new Promise((resolve) => squatter.close(resolve));
		}
	});
});

// `npm test` provides a throwaway PostgreSQL (scripts/test-postgres.js); this suite makes a
// database of its own there, so it cannot disturb the dialect tests running beside it.
const postgresUrl = process.env.TEST_POSTGRES_URL;

describe.skipIf(!postgresUrl)('the outbox sender on PostgreSQL', () => {
	it('two senders on one database deliver each message exactly once', async () => {
		const admin = createSequelize(postgresUrl!);
		const database = `orthogon_mail_${randomBytes(4).toString('hex')}`;
		await admin.query(`CREATE DATABASE ${database}`);
		const relay = await startCatcher();
		try {
			await closeDatabase();
			const { sequelize } = openDatabase(postgresUrl!.replace(/\/[^/]+$/, `/${database}`));
			await dbReady();
			expect(sequelize.getDialect()).toBe('postgres');
			await twoSendersDeliverExactlyOnce((await makeTeam()).id, relay);
		} finally {
			await relay.close();
			await closeDatabase();
			await admin.query(`DROP DATABASE IF EXISTS ${database}`);
			await admin.close();
		}
	}, 60_000);
});
