import { ApiToken, dbReady, User } from '../db';
import type { SessionUser } from './credentials';
import { randomSecret, sha256 } from './secrets';

const TOKEN_PREFIX = 'ogt';
const LAST_USED_GRANULARITY_MS = 60_000;

/** Creates a token for the user; the plain token is returned once and never stored. */
export async function createApiToken(userId: string, label: string) {
	await dbReady();
	const token = randomSecret(TOKEN_PREFIX);
	const record = await ApiToken.create({
		userId,
		label: label.trim(),
		tokenHash: sha256(token),
		prefix: token.slice(0, 10),
		lastUsedAt: null,
		revokedAt: null
	});
	return { token, record };
}

export async function listApiTokens(userId: string) {
	await dbReady();
	return ApiToken.findAll({ where: { userId, revokedAt: null }, order: [['createdAt', 'DESC']] });
}

/** Revokes one of the user's own tokens; false when there is no such live token. */
export async function revokeApiToken(userId: string, tokenId: string): Promise<boolean> {
	await dbReady();
	const [count] = await ApiToken.update(
		{ revokedAt: new Date() },
		{ where: { id: tokenId, userId, revokedAt: null } }
	);
	return count > 0;
}

/** Revokes every live token of the user (after a password change); returns how many. */
export async function revokeAllApiTokens(userId: string): Promise<number> {
	await dbReady();
	const [count] = await ApiToken.update(
		{ revokedAt: new Date() },
		{ where: { userId, revokedAt: null } }
	);
	return count;
}

/** The owner of a live token given as `Authorization: Bearer …`, or null. */
export async function userForApiToken(token: string): Promise<SessionUser | null> {
	await dbReady();
	const record = await ApiToken.findOne({ where: { tokenHash: sha256(token), revokedAt: null } });
	if (!record) {
		return null;
	}
	const user = await User.findByPk(record.userId);
	if (!user) {
		return null;
	}
	const now = Date.now();
	if (!record.lastUsedAt || now - record.lastUsedAt.getTime() > LAST_USED_GRANULARITY_MS) {
		await ApiToken.update({ lastUsedAt: new Date(now) }, { where: { id: record.id } });
	}
	return { id: user.id, email: user.email, name: user.name };
}
