import { error } from '@sveltejs/kit';
import { publicRoute } from '$lib/server/guard';
import { setPasswordByLink } from '$lib/server/new-password-action';
import { completeReset, findOpenReset } from '$lib/server/password-resets';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	publicRoute(event);
	const open = findOpenReset(event.params.token);
	if (!open) error(404, { message: 'This link is no longer valid. Ask for a new one at sign-in.' });
	return { email: open.email, name: open.name };
}) satisfies PageServerLoad;

export const actions = {
	default: (event) => {
		publicRoute(event);
		return setPasswordByLink(event, completeReset, '/signin?reset=1');
	}
} satisfies Actions;
