import { fail, redirect } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { EveningError } from '$lib/server/evenings/errors';
import { blankValues, formChoices, readEveningForm } from '$lib/server/evenings/form';
import { clubTimeZone } from '$lib/server/evenings/timezone';
import { createEvening } from '$lib/server/evenings/write';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	requireRight(event, 'evenings');
	return { values: blankValues(), ...formChoices(), timeZone: clubTimeZone() };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const user = requireRight(event, 'evenings');
		const read = readEveningForm(await event.request.formData());
		if (!read.ok) return fail(400, { values: read.values, message: read.message });
		let id: number;
		try {
			id = createEvening(read.input, user.id);
		} catch (e) {
			if (e instanceof EveningError) return fail(400, { values: read.values, message: e.message });
			throw e;
		}
		redirect(303, `/evenings/${id}`);
	}
} satisfies Actions;
