import { Op } from 'sequelize';
import { isUuid } from '../../uuid';
import { dbReady, Session, User } from '../db';
import type { SessionUser } from './credentials';

/** How long a browser stays signed in without a request; each request moves the end along. */
export const SESSION_MAX_AGE_SECONDS = 12 * 60 * 60;
// Moving the end along costs a write, so it happens at most this often per session.
const EXTEND_GRANULARITY_MS = 10 * 60 * 1000;

const endFromNow = () => new Date(Date.now() + SESSION_MAX_AGE_SECONDS * 1000);

/** Records a new signed-in browser for the user; the session cookie carries the returned id. */
export async function startSession(userId: string): Promise<string> {
	await dbReady();
	// Expired rows are swept here, by whichever server signs someone in: no timer, so nothing
	// needs claiming across servers.
	await Session.destroy({ where: { expiresAt: { [Op.lte]: new Date() } } });
	const session = await Session.create({ userId, expiresAt: endFromNow() });
	return session.id;
}

/**
 * The user of a live session, read in one query with the session row, or null when the session
 * was ended (sign-out, password change), has expired, or belongs to someone else.
 */
export async function userForSession(
	sessionId: string,
	userId: string
): Promise<SessionUser | null> {
	if (!isUuid(sessionId) || !isUuid(userId)) {
		return null;
	}
	await dbReady();
	const session = await Session.findOne({
		where: { id: sessionId, userId, expiresAt: { [Op.gt]: new Date() } },
		include: [{ model: User, as: 'user', attributes: ['id', 'email', 'name'], required: true }]
	});
	if (!session?.user) {
		return null;
	}
	if (endFromNow().getTime() - session.expiresAt.getTime() > EXTEND_GRANULARITY_MS) {
		await Session.update({ expiresAt: endFromNow() }, { where: { id: sessionId } });
	}
	const { id, email, name } = session.user;
	return { id, email, name };
}

/** Ends one session on every server: its cookie is refused from the next request on. */
export async function endSession(sessionId: string): Promise<void> {
	if (!isUuid(sessionId)) {
		return;
	}
	await dbReady();
	await Session.destroy({ where: { id: sessionId } });
}

/** Ends every session of the user except `keep` (the browser that asked); returns how many. */
export async function endOtherSessions(userId: string, keep: string | null): Promise<number> {
	await dbReady();
	const others = keep && isUuid(keep) ? { id: { [Op.ne]: keep } } : {};
	return Session.destroy({ where: { userId, ...others } });
}
