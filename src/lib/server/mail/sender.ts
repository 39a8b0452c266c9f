import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import nodemailer, { type Transporter } from 'nodemailer';
import { Op } from 'sequelize';
import { dbReady, OutboxMessage } from '../db';
import { backoffMs, smtpTarget, type MailConfig } from './config';
import { mailQueued, outboxMessageId } from './outbox';

/** What one round did, for tests and logs. */
export type DeliveryRound = { sent: number; retried: number; failed: number; lostClaims: number };

type SenderOptions = {
	/** The clock; tests pass their own to step through backoff without sleeping. */
	now?: () => Date;
	/** A name for `claimedBy`; unique per sender by default (host, process, random). */
	id?: string;
};

const MAX_ERROR_CHARS = 2000;

/**
 * Delivers the outbox in the background. Any number of senders (one per app server) may share a
 * database: each message is claimed by one conditional UPDATE and only the sender whose UPDATE
 * changed the row sends it. A claim is a lease: a sender that dies mid-send leaves the row
 * `sending` until the lease ends, and then any sender claims it again.
 */
export class MailSender {
	readonly id: string;
	readonly #config: MailConfig;
	readonly #now: () => Date;
	readonly #transport: Transporter;
	#running = false;
	#stopping = false;
	#timer: NodeJS.Timeout | null = null;
	#round: Promise<void> | null = null;
	#wokenDuringRound = false;

	constructor(config: MailConfig, options: SenderOptions = {}) {
		this.#config = config;
		this.#now = options.now ?? (() => new Date());
		this.id = options.id ?? `${hostname()}-${process.pid}-${randomUUID().slice(0, 8)}`.slice(0, 64);
		const timeout = config.sendTimeoutMs;
		this.#transport = nodemailer.createTransport({
			...smtpTarget(config),
			connectionTimeout: timeout,
			greetingTimeout: timeout,
			socketTimeout: timeout,
			dnsTimeout: timeout
		});
	}

	/** Starts the loop: a round now, then one every poll interval or as soon as mail is queued. */
	start(): void {
		if (this.#running) {
			return;
		}
		this.#running = true;
		mailQueued.on('queued', this.#wake);
		this.#schedule(0);
	}

	/** Stops the loop and waits for a round in progress to finish its current message. */
	async stop(): Promise<void> {
		this.#running = false;
		this.#stopping = true;
		mailQueued.off('queued', this.#wake);
		if (this.#timer) {
			clearTimeout(this.#timer);
			this.#timer = null;
		}
		await this.#round;
		this.#transport.close();
	}

	/** Running and between rounds (waiting for its next poll or a wake-up). */
	isIdle(): boolean {
		return this.#running && this.#round === null;
	}

	/**
	 * One round: claims and sends every message that is due (queued and past its next-try time, or
	 * `sending` with an expired lease), a batch at a time. Tests call it directly.
	 */
	async deliverDue(): Promise<DeliveryRound> {
		await dbReady();
		const round: DeliveryRound = { sent: 0, retried: 0, failed: 0, lostClaims: 0 };
		for (;;) {
			const due = await OutboxMessage.findAll({
				attributes: ['id'],
				where: this.#dueCondition(),
				order: [['nextAttemptAt', 'ASC']],
				limit: this.#config.batchSize
			});
			const lostBefore = round.lostClaims;
			for (const { id } of due) {
				if (this.#stopping) {
					return round;
				}
				await this.#deliverOne(id, round);
			}
			// A short batch means nothing else was due; a full one may have left some behind. When
			// another sender won every claim of a batch, it is working through them: leave it to it.
			const lostAll = round.lostClaims - lostBefore === due.length;
			if (due.length < this.#config.batchSize || lostAll) {
				return round;
			}
		}
	}

	#dueCondition() {
		return {
			status: { [Op.in]: ['queued', 'sending'] },
			nextAttemptAt: { [Op.lte]: this.#now() }
		};
	}

	async #deliverOne(id: string, round: DeliveryRound): Promise<void> {
		const now = this.#now();
		// The claim: one conditional UPDATE. Of several senders racing for a row, the database lets
		// exactly one change it; the others see 0 rows changed and leave the message alone.
		const [changed] = await OutboxMessage.update(
			{
				status: 'sending',
				claimedBy: this.id,
				attempts: OutboxMessage.sequelize!.literal('attempts + 1') as unknown as number,
				nextAttemptAt: new Date(now.getTime() + this.#config.claimLeaseMs)
			},
			{ where: { id, ...this.#dueCondition() }, validate: false }
		);
		if (changed !== 1) {
			round.lostClaims += 1;
			return;
		}
		const message = await OutboxMessage.findByPk(id);
		if (!message) {
			return;
		}
		if (message.attempts > this.#config.maxAttempts) {
			// The last try was interrupted (its sender stopped mid-send): whether it left is unknown,
			// and trying once more could send it twice, so it stops here and says so.
			await this.#settle(message, 'failed', {
				lastError: `Gave up after ${this.#config.maxAttempts} tries; the last one was interrupted (the sender stopped mid-send), so it may or may not have been delivered.`
			});
			round.failed += 1;
			return;
		}
		try {
			await this.#transport.sendMail({
				from: this.#config.from,
				to: message.to,
				subject: message.subject,
				text: message.text,
				// The same id on every try, so a receiver can tell a retry from a second message.
				messageId: outboxMessageId(message.id)
			});
		} catch (caught) {
			await this.#recordFailure(message, caught, round);
			return;
		}
		// Marked sent whoever holds the claim now: it did go out.
		await OutboxMessage.update(
			{ status: 'sent', sentAt: this.#now(), lastError: null },
			{ where: { id: message.id } }
		);
		round.sent += 1;
	}

	async #recordFailure(message: OutboxMessage, caught: unknown, round: DeliveryRound) {
		const lastError = describeSmtpError(caught);
		if (message.attempts >= this.#config.maxAttempts) {
			await this.#settle(message, 'failed', { lastError });
			round.failed += 1;
			return;
		}
		const wait = backoffMs(this.#config, message.attempts);
		await this.#settle(message, 'queued', {
			lastError,
			nextAttemptAt: new Date(this.#now().getTime() + wait)
		});
		round.retried += 1;
	}

	/** Ends this sender's claim; skipped if the claim was lost meanwhile (another try is underway). */
	async #settle(
		message: OutboxMessage,
		status: 'queued' | 'failed',
		fields: { lastError: string; nextAttemptAt?: Date }
	) {
		await OutboxMessage.update(
			{ status, ...fields },
			{ where: { id: message.id, claimedBy: this.id, attempts: message.attempts } }
		);
	}

	#schedule(delayMs: number) {
		if (!this.#running) {
			return;
		}
		this.#timer = setTimeout(() => this.#runRound(), delayMs);
		// The loop never holds the process open: shutting down the app server is enough.
		this.#timer.unref();
	}

	#runRound() {
		this.#timer = null;
		this.#wokenDuringRound = false;
		this.#round = this.deliverDue()
			.then(() => undefined)
			.catch((caught: unknown) => {
				// A database hiccup must not end the loop; the rows wait for the next round.
				console.error('[mail] A delivery round failed; the next one retries:', caught);
			})
			.finally(() => {
				this.#round = null;
				this.#schedule(this.#wokenDuringRound ? 0 : this.#config.pollIntervalMs);
			});
	}

	#wake = () => {
		if (this.#round) {
			this.#wokenDuringRound = true;
		} else if (this.#timer) {
			clearTimeout(this.#timer);
			this.#schedule(0);
		}
	};
}

/** The relay's answer (code and text) or the connection problem, short enough to show. */
export function describeSmtpError(caught: unknown): string {
	if (!(caught instanceof Error)) {
		return String(caught).slice(0, MAX_ERROR_CHARS);
	}
	const smtp = caught as Error & { code?: string; response?: string; responseCode?: number };
	const parts = [smtp.response ?? smtp.message];
	if (smtp.code && !parts[0]!.includes(smtp.code)) {
		parts.push(`(${smtp.code})`);
	}
	return parts.join(' ').slice(0, MAX_ERROR_CHARS);
}
