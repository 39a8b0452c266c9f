import { Op } from 'sequelize';
import type { OutboxMessageAnswer } from '../../api/answers';
import { dbReady, OutboxMessage, ReceivedMail } from '../db';
import { outboxMessageId } from '../mail/outbox';

/** The most messages one outbox answer holds (newest first); the answer says when there are more. */
export const OUTBOX_LIST_LIMIT = 500;

export type Listed<T> = { items: T[]; more: boolean };

/** The teams' outbox, newest first, in the `GET /api/outbox` shape. */
export async function outboxOf(teamIds: string[]): Promise<Listed<OutboxMessageAnswer>> {
	await dbReady();
	const rows = await OutboxMessage.findAll({
		where: { teamId: { [Op.in]: teamIds } },
		order: [
			['createdAt', 'DESC'],
			['id', 'ASC']
		],
		limit: OUTBOX_LIST_LIMIT + 1
	});
	return {
		items: rows.slice(0, OUTBOX_LIST_LIMIT).map((row) => ({
			id: row.id,
			to: row.to,
			subject: row.subject,
			text: row.text,
			status: row.status,
			attempts: row.attempts,
			lastError: row.lastError,
			createdAt: row.createdAt.toISOString(),
			sentAt: row.sentAt?.toISOString() ?? null
		})),
		more: rows.length > OUTBOX_LIST_LIMIT
	};
}

export type ReceivedMailRow = {
	id: string;
	from: string | null;
	to: string;
	subject: string;
	text: string;
	receivedAt: string;
};

/**
 * What the local mail catcher received of these outbox messages, newest first, matched by the
 * Message-ID the sender sets. Matching by recipient instead would show a lead the mails another
 * team sent to a person who belongs to both teams.
 */
export async function receivedOf(outboxIds: string[]): Promise<ReceivedMailRow[]> {
	if (outboxIds.length === 0) {
		return [];
	}
	await dbReady();
	const rows = await ReceivedMail.findAll({
		where: { messageId: { [Op.in]: outboxIds.map(outboxMessageId) } },
		order: [['receivedAt', 'DESC']]
	});
	return rows.map((row) => ({
		id: row.id,
		from: row.from,
		to: row.to,
		subject: row.subject,
		text: row.text,
		receivedAt: row.receivedAt.toISOString()
	}));
}
