// Shared by the People page's form and the invitations API.
import { z } from 'zod';
import { lineText } from './text';
import { ROLES } from '../domain';
import { emailAddress } from './email';

export const roleList = z
	.array(z.enum(ROLES, { message: 'Unknown role.' }))
	.min(1, 'Choose at least one role.')
	.max(ROLES.length);

export const inviteSchema = z.object({
	email: emailAddress,
	name: lineText(100, 'name').min(1, 'Enter a name.'),
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

export const invitationIdSchema = z.object({
	id: z.coerce
		.number({ error: 'Choose an invitation.' })
		.int('Choose an invitation.')
		.positive('Choose an invitation.')
});
