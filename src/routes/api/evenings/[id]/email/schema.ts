import { z } from 'zod';
import { ROLES } from '$lib/domain';

/** POST /api/evenings/:id/email: whom to send the run order to, and a note of the sender's. */
export const emailSchema = z.strictObject({
	roles: z.array(z.enum(ROLES)).max(ROLES.length).optional(),
	userIds: z.array(z.number().int().positive()).max(500).optional(),
	message: z.string().max(2000, 'Keep the message under 2,000 characters.').optional()
});
