// A new password, typed twice: for an invitation and for a reset alike.
import { z } from 'zod';

export const PASSWORD_MIN = 10;

export const newPasswordSchema = z
	.object({
		password: z
			.string({ error: 'Enter a password.' })
			.min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
			.max(200, 'Use at most 200 characters.'),
		confirm: z.string({ error: 'Enter the password again.' })
	})
	.refine((v) => v.password === v.confirm, {
		message: 'The two passwords differ.',
		path: ['confirm']
	});
