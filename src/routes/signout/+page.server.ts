import { redirect } from '@sveltejs/kit';
import { signOut } from '../../auth';
import { publicRoute } from '$lib/server/guard';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	publicRoute(event);
	redirect(303, '/');
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		publicRoute(event);
		try {
			await signOut(event);
		} catch {
			// Auth.js redirects after clearing the cookie; we choose where to.
		}
		redirect(303, '/signin');
	}
} satisfies Actions;
