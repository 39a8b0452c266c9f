import net from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { OutboxMessage } from '../../src/lib/server/db';
import { queueMail, type MailDraft } from '../../src/lib/server/mail/outbox';

/** A clock the test moves by hand, so backoff can be stepped through without sleeping. */
export class TestClock {
	#ms: number;
	constructor(start = Date.now() + 1000) {
		this.#ms = start;
	}
	now = () => new Date(this.#ms);
	advance(ms: number) {
		this.#ms += ms;
	}
}

/** Queues `count` mails for one team in one committed transaction, as a request would. */
export async function queueSome(teamId: string, count: number, prefix = 'Note'): Promise<void> {
	const drafts: MailDraft[] = Array.from({ length: count }, (_, i) => ({
		teamId,
		to: `person${i}@lab.example`,
		subject: `${prefix} ${i}`,
		text: `Body of ${prefix} ${i}.\nSee http://localhost/routes/1`
	}));
	await OutboxMessage.sequelize!.transaction((transaction) => queueMail(drafts, transaction));
}

export type CaughtMail = { messageId: string; to: string; subject: string; text: string };

/**
 * A real SMTP server on 127.0.0.1 that keeps what it accepts in memory. It refuses the first
 * `refuse` recipients with a temporary error (451), as a relay under load does.
 */
export async function startCatcher(options: { port?: number; refuse?: number } = {}) {
	const received: CaughtMail[] = [];
	let refusals = 0;
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		logger: false,
		// Loopback only; a reverse DNS lookup per connection would cost time and tell nothing.
		disableReverseLookup: true,
		onRcptTo(_address, _session, callback) {
			if (refusals < (options.refuse ?? 0)) {
				refusals += 1;
				callback(Object.assign(new Error('Mailbox busy, try later'), { responseCode: 451 }));
				return;
			}
			callback();
		},
		onData(stream, _session, callback) {
			simpleParser(stream).then((parsed) => {
				const to = Array.isArray(parsed.to) ? parsed.to[0] : parsed.to;
				received.push({
					messageId: parsed.messageId ?? '',
					to: to?.text ?? '',
					subject: parsed.subject ?? '',
					text: parsed.text ?? ''
				});
				callback();
			}, callback);
		}
	});
	await new Promise<void>((resolve) => server.listen(options.port ?? 0, '127.0.0.1', resolve));
	const address = server.server.address() as net.AddressInfo;
	return {
		port: address.port,
		received,
		refusals: () => refusals,
		close: () => new Promise<void>((resolve) => server.close(() => resolve()))
	};
}

/** A port nothing listens on right now. */
export function unusedPort(): Promise<number> {
	return new Promise((resolve, reject) => {
		const probe = net.createServer();
		probe.on('error', reject);
		probe.listen(0, '127.0.0.1', () => {
			const { port } = probe.address() as net.AddressInfo;
			probe.close(() => resolve(port));
		});
	});
}

export async function outboxRows() {
	return OutboxMessage.findAll({ order: [['subject', 'ASC']] });
}
