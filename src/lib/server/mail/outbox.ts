import { EventEmitter } from 'node:events';
import type { Transaction } from 'sequelize';
import { OutboxMessage } from '../db';

/** A mail to queue: which team's outbox it belongs to, one recipient, plain text. */
export type MailDraft = { teamId: string; to: string; subject: string; text: string };

/**
 * Fired after a transaction that queued mail commits. It only wakes this process's sender early;
 * the sender's poll of the outbox table is what guarantees delivery (other servers find the rows
 * on their next poll), so nothing depends on the event arriving.
 */
export const mailQueued = new EventEmitter();

/**
 * The Message-ID the sender gives an outbox message, the same on every try, so a receiver can
 * tell a retry from a new mail and the Outbox page can find the local catcher's copy.
 */
export function outboxMessageId(outboxId: string): string {
	return `<${outboxId}@orthogon>`;
}

/**
 * Writes the messages to the outbox inside the caller's transaction, so the change and its mails
 * commit together or not at all. Nothing is sent here: the request never waits for a mail server.
 */
export async function queueMail(drafts: MailDraft[], transaction: Transaction): Promise<void> {
	if (drafts.length === 0) {
		return;
	}
	const now = new Date();
	await OutboxMessage.bulkCreate(
		drafts.map((draft) => ({
			teamId: draft.teamId,
			to: draft.to,
			subject: draft.subject.slice(0, 300),
			text: draft.text,
			lastError: null,
			nextAttemptAt: now,
			claimedBy: null,
			sentAt: null
		})),
		{ transaction }
	);
	transaction.afterCommit(() => {
		mailQueued.emit('queued');
	});
}
