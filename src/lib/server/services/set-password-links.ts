import { Op, type Transaction } from 'sequelize';
import { dbReady, SetPasswordLink, User } from '../db';
import { hashPassword } from '../auth/passwords';
import { randomSecret, sha256 } from '../auth/secrets';

const LINK_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** Issues a one-time link token for the user (valid 7 days); older unused links stop working. */
export async function issueSetPasswordLink(
	userId: string,
	transaction?: Transaction
): Promise<string> {
	const token = randomSecret('osp');
	await SetPasswordLink.update(
		{ usedAt: new Date() },
		{ where: { userId, usedAt: null }, transaction }
	);
	await SetPasswordLink.create(
		{
			userId,
			tokenHash: sha256(token),
			expiresAt: new Date(Date.now() + LINK_LIFETIME_MS),
			usedAt: null
		},
		{ transaction }
	);
	return token;
}

async function liveLink(token: string) {
	return SetPasswordLink.findOne({
		where: { tokenHash: sha256(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } }
	});
}

/** Who a link is for, while it is unused and unexpired. */
export async function setPasswordLinkOwner(token: string) {
	await dbReady();
	const link = await liveLink(token);
	if (!link) {
		return null;
	}
	const user = await User.findByPk(link.userId);
	return user ? { email: user.email, name: user.name } : null;
}

/** Sets the password and spends the link; false when the link is used, expired or unknown. */
export async function setPasswordWithLink(token: string, password: string): Promise<boolean> {
	await dbReady();
	const passwordHash = await hashPassword(password);
	return SetPasswordLink.sequelize!.transaction(async (transaction) => {
		const link = await liveLink(token);
		if (!link) {
			return false;
		}
		const [spent] = await SetPasswordLink.update(
			{ usedAt: new Date() },
			{ where: { id: link.id, usedAt: null }, transaction }
		);
		if (spent === 0) {
			return false;
		}
		await User.update({ passwordHash }, { where: { id: link.userId }, transaction });
		return true;
	});
}
