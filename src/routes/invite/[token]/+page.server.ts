import { error } from '@sveltejs/kit';
import { publicRoute } from '$lib/server/guard';
import { acceptInvitation, findOpenInvitation } from '$lib/server/invitations';
import { setPasswordByLink } from '$lib/server/new-password-action';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	publicRoute(event);
	const inv = findOpenInvitation(event.params.token);
	if (!inv) error(404, { message: 'This invitation link is no longer valid. Ask for a new one.' });
	return { email: inv.email, name: inv.name, roles: inv.roles };
}) satisfies PageServerLoad;

export const actions = {
	default: (event) => {
		publicRoute(event);
		return setPasswordByLink(event, acceptInvitation, '/signin?welcome=1');
	}
} satisfies Actions;
