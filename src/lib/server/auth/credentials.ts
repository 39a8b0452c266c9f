import { dbReady, User } from '../db';
import { burnPasswordCheck, verifyPassword } from './passwords';

import type { SessionUser } from '../../types';
export type { SessionUser };

export function normaliseEmail(email: string): string {
	return email.trim().toLowerCase();
}

/** The user whose e-mail and password match, or null (unknown e-mail, no password yet, or wrong). */
export async function verifyCredentials(
	email: unknown,
	password: unknown
): Promise<SessionUser | null> {
	if (typeof email !== 'string' || typeof password !== 'string' || !email || !password) {
		return null;
	}
	await dbReady();
	const user = await User.findOne({ where: { email: normaliseEmail(email) } });
	if (!user?.passwordHash) {
		await burnPasswordCheck(password);
		return null;
	}
	if (!(await verifyPassword(password, user.passwordHash))) {
		return null;
	}
	return { id: user.id, email: user.email, name: user.name };
}
