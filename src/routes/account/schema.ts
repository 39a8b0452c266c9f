import { z } from 'zod';
import { FIELD_LIMITS } from '$lib/schemas/limits';
import { chosenPassword } from '$lib/schemas/password';
import { text } from '$lib/schemas/text';

export const createTokenSchema = z.object({
	label: text()
		.trim()
		.min(FIELD_LIMITS.tokenLabel.min, 'Name the token after what will use it.')
		.max(
			FIELD_LIMITS.tokenLabel.max,
			`Keep the label to ${FIELD_LIMITS.tokenLabel.max} characters.`
		)
});

export const changePasswordSchema = z
	.object({
		current: z.string().min(1, 'Enter your current password.'),
		next: chosenPassword,
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

// An unticked checkbox sends nothing, so absent means "off" when the form is posted; the page
// fills in the person's current choice.
export const mailChoicesSchema = z.object({ commentMails: z.boolean().default(false) });
