import { CredentialsSignin } from '@auth/core/errors';
import { fail, isRedirect, redirect } from '@sveltejs/kit';
import { credentialsSchema, signIn } from '../../auth';
import { publicRoute } from '$lib/server/guard';
import { setTimeout as sleep } from 'node:timers/promises';
import { clearPair, recordFailure, signInGate } from '$lib/server/sign-in-limit';
import type { Actions, PageServerLoad } from './$types';

const WRONG = 'That e-mail and password do not match an account.';

/** Only same-site paths, so the sign-in page cannot be used to send people elsewhere. */
const safeTarget = (to: string | null) => (to && /^\/(?!\/)/.test(to) ? to : '/');

export const load = ((event) => {
	publicRoute(event);
	if (event.locals.user) redirect(303, safeTarget(event.url.searchParams.get('redirectTo')));
	const q = event.url.searchParams;
	return {
		redirectTo: safeTarget(q.get('redirectTo')),
		notice: q.has('reset')
			? 'Your new password is set. Sign in with it.'
			: q.has('welcome')
				? 'Your password is set. Sign in with it.'
				: null
	};
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		publicRoute(event);
		const form = await event.request.clone().formData();
		// Echoed back into the form; a hostile length is cut, never stored.
		const email = String(form.get('email') ?? '').slice(0, 254);
		const parsed = credentialsSchema.safeParse({ email, password: form.get('password') });
		if (!parsed.success) {
			return fail(400, { email, message: parsed.error.issues[0]?.message ?? WRONG });
		}
		const address = event.getClientAddress();
		const gate = signInGate(parsed.data.email, address);
		if (gate.limited) {
			return fail(429, {
				email,
				message: 'Too many failed sign-ins. Wait fifteen minutes, then try again.'
			});
		}
		// An account under attack from many addresses is slowed for everyone, never shut.
		if (gate.delayMs) await sleep(gate.delayMs);
		try {
			await signIn(event);
		} catch (e) {
			// Auth.js answers with a redirect on success; a failure is a CredentialsSignin error
			// (or, in some versions, a redirect to ?error=).
			if (isRedirect(e) && !e.location.includes('error=')) {
				clearPair(parsed.data.email, address);
				redirect(303, safeTarget(String(form.get('redirectTo') ?? '/')));
			}
			if (!isRedirect(e) && !(e instanceof CredentialsSignin)) throw e;
		}
		recordFailure(parsed.data.email, address);
		return fail(400, { email, message: WRONG });
	}
} satisfies Actions;
