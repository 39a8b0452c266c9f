import { Op } from 'sequelize';
import type { OutboxMessageAnswer } from '../../api/answers';
import { dbReady, Membership, OutboxMessage, ReceivedMail, User } from '../db';

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
 * What the local mail catcher received for the teams' members, newest first. The catcher keeps
 * the To header as written, so a member matches when their address appears in it.
 */
export async function receivedByMembersOf(teamIds: string[]): Promise<Listed<ReceivedMailRow>> {
	await dbReady();
	const members = await Membership.findAll({
		where: { teamId: { [Op.in]: teamIds } },
		include: [{ model: User, as: 'user', attributes: ['email'] }]
	});
	const emails = [...new Set(members.flatMap((m) => (m.user ? [m.user.email] : [])))];
	if (emails.length === 0) {
		return { items: [], more: false };
	}
	const rows = await ReceivedMail.findAll({
		// LIKE reads `_` and `%` as wildcards (and SQLite has no default escape), so it only narrows
		// the rows; the exact match is made below.
		where: { [Op.or]: emails.map((email) => ({ to: { [Op.like]: `%${email}%` } })) },
		order: [['receivedAt', 'DESC']],
		limit: OUTBOX_LIST_LIMIT + 1
	});
	const addressed = rows.filter((row) => emails.some((email) => row.to.includes(email)));
	return {
		items: addressed.slice(0, OUTBOX_LIST_LIMIT).map((row) => ({
			id: row.id,
			from: row.from,
			to: row.to,
			subject: row.subject,
			text: row.text,
			receivedAt: row.receivedAt.toISOString()
		})),
		more: rows.length > OUTBOX_LIST_LIMIT
	};
}
