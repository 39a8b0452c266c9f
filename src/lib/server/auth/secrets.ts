import { createHash, randomBytes } from 'node:crypto';

/** A random URL-safe secret with a readable prefix, e.g. `randomSecret('ogt')` → `ogt_3vQ…`. */
export function randomSecret(prefix: string, bytes = 24): string {
	return `${prefix}_${randomBytes(bytes).toString('base64url')}`;
}

/** Hex SHA-256, used to store tokens and links so a database leak does not leak them. */
export function sha256(value: string): string {
	return createHash('sha256').update(value).digest('hex');
}
