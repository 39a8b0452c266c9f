import bcrypt from 'bcryptjs';

const COST = 10;
export { MIN_PASSWORD_LENGTH } from '../../schemas/password';

export function hashPassword(password: string): Promise<string> {
	return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
	return bcrypt.compare(password, hash);
}

// Compared against when the e-mail is unknown, so a wrong address takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('orthogon-no-such-user', COST);
export function burnPasswordCheck(password: string): Promise<boolean> {
	return bcrypt.compare(password, DUMMY_HASH);
}
