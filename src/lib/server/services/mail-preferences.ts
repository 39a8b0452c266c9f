import { Op } from 'sequelize';
import { dbReady, MailPreference } from '../db';

/** Whether the person wants mails about comments (on unless they turned it off). */
export async function commentMailsOn(userId: string): Promise<boolean> {
	await dbReady();
	const row = await MailPreference.findByPk(userId);
	return row?.commentMails ?? true;
}

/** Of these people, the ones who turned comment mails off. */
export async function commentMailsOff(userIds: string[]): Promise<Set<string>> {
	if (userIds.length === 0) {
		return new Set();
	}
	await dbReady();
	const rows = await MailPreference.findAll({
		where: { userId: { [Op.in]: userIds }, commentMails: false },
		attributes: ['userId']
	});
	return new Set(rows.map((row) => row.userId));
}

/** Turns the person's comment mails on or off (Account page). */
export async function setCommentMails(userId: string, on: boolean): Promise<void> {
	await dbReady();
	await MailPreference.upsert({ userId, commentMails: on });
}
