import { z } from 'zod';

export const MIN_PASSWORD_LENGTH = 10;

/** Choosing a password (set-password link): entered twice, at least 10 characters. */
export const newPasswordSchema = z
	.object({
		password: z
			.string()
			.min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`),
		confirm: z.string()
	})
	.refine((v) => v.password === v.confirm, {
		path: ['confirm'],
		message: 'The two passwords differ.'
	});
