import { z } from 'zod';
import { MIN_PASSWORD_LENGTH } from '$lib/schemas/password';

export const createTokenSchema = z.object({
	label: z.string().trim().min(2, 'Name the token after what will use it.').max(80)
});

export const changePasswordSchema = z
	.object({
		current: z.string().min(1, 'Enter your current password.'),
		next: z.string().min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`),
		confirm: z.string()
	})
	.refine((v) => v.next === v.confirm, { path: ['confirm'], message: 'The two new passwords differ.' });
