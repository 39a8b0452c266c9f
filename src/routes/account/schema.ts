import { z } from 'zod';
import { MIN_PASSWORD_LENGTH } from '$lib/schemas/password';
import { text } from '$lib/schemas/text';

export const createTokenSchema = z.object({
	label: text().trim().min(2, 'Name the token after what will use it.').max(80)
});

export const changePasswordSchema = z
	.object({
		current: z.string().min(1, 'Enter your current password.'),
		next: z.string().min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`),
		confirm: z.string(),
		// An unticked checkbox sends nothing, so absent means false here; the page ticks it at first
		// (see changePasswordDefaults).
		revokeTokens: z.boolean().default(false)
	})
	.refine((v) => v.next === v.confirm, {
		path: ['confirm'],
		message: 'The two new passwords differ.'
	});

// Ticked at first: a password is usually changed because it may have leaked, and a token made by
// whoever had it would otherwise keep working. Unticked, scripts keep running.
export const changePasswordDefaults = { current: '', next: '', confirm: '', revokeTokens: true };
