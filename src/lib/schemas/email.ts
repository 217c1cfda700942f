// An e-mail address as every form takes it (sign-in, forgot password, invitations): trimmed,
// lower-cased, at most 254 characters (RFC 5321's path limit less its angle brackets).
import { z } from 'zod';

export const emailAddress = z
	.string({ error: 'Enter your e-mail address.' })
	.trim()
	.toLowerCase()
	.max(254, 'That e-mail address is too long.')
	.email('Enter an e-mail address.');
