import { fail } from '@sveltejs/kit';
import { z } from 'zod';
import { emailAddress } from '$lib/schemas/email';
import { publicRoute } from '$lib/server/guard';
import { requestReset, RESET_MINUTES, resetAskLimit } from '$lib/server/password-resets';
import type { Actions, PageServerLoad } from './$types';

const askSchema = z.object({ email: emailAddress });

export const load = ((event) => {
	publicRoute(event);
	return { minutes: RESET_MINUTES };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		publicRoute(event);
		const form = await event.request.formData();
		const email = String(form.get('email') ?? '').slice(0, 254);
		const parsed = askSchema.safeParse({ email });
		if (!parsed.success) return fail(400, { email, message: parsed.error.issues[0]?.message });
		if (!resetAskLimit.take(event.getClientAddress())) {
			return fail(429, {
				email,
				message: 'That is a lot of asking from here. Wait an hour, then try again.'
			});
		}
		requestReset(parsed.data.email);
		// The same answer whether or not the address has an account.
		return { asked: parsed.data.email };
	}
} satisfies Actions;
