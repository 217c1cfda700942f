import { error, fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { publicRoute } from '$lib/server/guard';
import { acceptInvitation, findOpenInvitation, InvitationError } from '$lib/server/invitations';
import type { Actions, PageServerLoad } from './$types';

const passwordSchema = z
	.object({
		password: z
			.string()
			.min(10, 'Use at least 10 characters.')
			.max(200, 'Use at most 200 characters.'),
		confirm: z.string()
	})
	.refine((v) => v.password === v.confirm, {
		message: 'The two passwords differ.',
		path: ['confirm']
	});

export const load = ((event) => {
	publicRoute(event);
	const inv = findOpenInvitation(event.params.token);
	if (!inv) error(404, { message: 'This invitation link is no longer valid. Ask for a new one.' });
	return { email: inv.email, name: inv.name, roles: inv.roles };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		publicRoute(event);
		const form = Object.fromEntries(await event.request.formData());
		const parsed = passwordSchema.safeParse(form);
		if (!parsed.success) {
			return fail(400, { message: parsed.error.issues[0]?.message ?? 'Check the password.' });
		}
		try {
			await acceptInvitation(event.params.token, parsed.data.password);
		} catch (e) {
			if (e instanceof InvitationError) return fail(400, { message: e.message });
			throw e;
		}
		redirect(303, '/signin?welcome=1');
	}
} satisfies Actions;
