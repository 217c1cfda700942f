// Shared by the People page's form and the invitations API.
import { z } from 'zod';
import { ROLES } from '../domain';
import { emailAddress } from './email';

export const roleList = z
	.array(z.enum(ROLES, { message: 'Unknown role.' }))
	.min(1, 'Choose at least one role.')
	.max(ROLES.length);

export const inviteSchema = z.object({
	email: emailAddress,
	name: z
		.string()
		.trim()
		.min(1, 'Enter a name.')
		.max(100, 'Keep the name under 100 characters.')
		.refine((s) => !/[\p{Cc}\u202a-\u202e\u2066-\u2069]/u.test(s), 'Remove control characters.'),
	roles: roleList
});

export const rolesSchema = z.object({
	userId: z.coerce.number().int().positive(),
	roles: roleList
});

export const withdrawSchema = z.object({
	userId: z.coerce
		.number({ error: 'Choose a person.' })
		.int('Choose a person.')
		.positive('Choose a person.')
});
