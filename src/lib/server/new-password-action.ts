// The form action behind a one-time link that sets a password (an invitation, a reset): the same
// checks, the same answers. Each route's action says it is public before calling this.
import { fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { newPasswordSchema } from '$lib/schemas/password';
import { LinkError } from './one-time-token';

export async function setPasswordByLink(
	event: RequestEvent<{ token: string }>,
	complete: (token: string, password: string) => Promise<unknown>,
	then: string
) {
	const form = Object.fromEntries(await event.request.formData());
	const parsed = newPasswordSchema.safeParse(form);
	if (!parsed.success) {
		return fail(400, { message: parsed.error.issues[0]?.message ?? 'Check the password.' });
	}
	try {
		await complete(event.params.token, parsed.data.password);
	} catch (e) {
		if (e instanceof LinkError) return fail(400, { message: e.message });
		throw e;
	}
	redirect(303, then);
}
