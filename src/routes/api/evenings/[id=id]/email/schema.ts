import { z } from 'zod';
import { blockText } from '$lib/schemas/text';
import { ROLES } from '$lib/domain';

/** POST /api/evenings/:id/email: whom to send the run order to, and a note of the sender's. */
export const emailSchema = z.strictObject({
	roles: z.array(z.enum(ROLES)).max(ROLES.length).optional(),
	userIds: z.array(z.number().int().positive()).max(500).optional(),
	message: blockText(2000, 'message').optional()
});
