import { z } from 'zod';

export const signInSchema = z.object({
	email: z.email('Enter the e-mail address you were invited with.'),
	password: z.string().min(1, 'Enter your password.'),
	redirectTo: z.string().default('')
});
