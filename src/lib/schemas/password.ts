import { z } from 'zod';
import { FIELD_LIMITS } from './limits';

const { min, maxBytes } = FIELD_LIMITS.password;
export const MIN_PASSWORD_LENGTH = min;

const utf8Bytes = (value: string) => new TextEncoder().encode(value).length;

/**
 * A password being chosen: long enough, and short enough for bcrypt to read all of it (it reads 72
 * bytes; a longer one would be cut without a word, so the rest would not count).
 */
export const chosenPassword = z
	.string()
	.min(min, `Use at least ${min} characters.`)
	.refine(
		(value) => utf8Bytes(value) <= maxBytes,
		`Use at most ${maxBytes} characters (fewer with accented letters or symbols).`
	);

/** Choosing a password (set-password link): entered twice, at least 10 characters. */
export const newPasswordSchema = z
	.object({
		password: chosenPassword,
		confirm: z.string()
	})
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ.'
	});
