import { dbReady, User } from '../db';
import { hashPassword, verifyPassword } from '../auth/passwords';

/** Changes a password after checking the current one; false when the current one is wrong. */
export async function changeOwnPassword(
	userId: string,
	current: string,
	next: string
): Promise<boolean> {
	await dbReady();
	const user = await User.findByPk(userId);
	if (!user?.passwordHash || !(await verifyPassword(current, user.passwordHash))) {
		return false;
	}
	await user.update({ passwordHash: await hashPassword(next) });
	return true;
}
