import { error, fail, redirect } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { EveningError } from '$lib/server/evenings/errors';
import { formChoices, readEveningForm, valuesOf } from '$lib/server/evenings/form';
import { loadEvening } from '$lib/server/evenings/load';
import { eveningIdOf } from '$lib/server/evenings/respond';
import { deleteEvening, updateEvening } from '$lib/server/evenings/write';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	requireRight(event, 'evenings');
	const evening = loadEvening(eveningIdOf(event.params));
	if (!evening) error(404, { message: 'There is no such evening.' });
	return {
		evening: { id: evening.id, title: evening.title, version: evening.version },
		values: valuesOf(evening),
		...formChoices(),
		timeZone: evening.timeZone
	};
}) satisfies PageServerLoad;

export const actions = {
	save: async (event) => {
		requireRight(event, 'evenings');
		const id = eveningIdOf(event.params);
		const current = loadEvening(id);
		if (!current) error(404, { message: 'There is no such evening.' });
		const form = await event.request.formData();
		const read = readEveningForm(form);
		if (!read.ok) return fail(400, { values: read.values, message: read.message });
		const version = Number(form.get('version')) || undefined;
		const ps = current.planSettings;
		try {
			updateEvening(id, {
				...read.input,
				// Keep the planner settings the form does not show.
				planSettings: {
					...current.planSettings,
					mustPlay: read.input.planSettings?.mustPlay ?? [],
					neverPlay: {
						...ps.neverPlay,
						danceIds: read.input.planSettings?.neverPlay?.danceIds ?? []
					},
					// The form's own settings over the ones it does not show.
					settings: { ...ps.settings, ...read.input.planSettings?.settings }
				},
				version
			});
		} catch (e) {
			if (e instanceof EveningError)
				return fail(e.status === 409 ? 409 : 400, { values: read.values, message: e.message });
			throw e;
		}
		redirect(303, `/evenings/${id}`);
	},
	delete: async (event) => {
		requireRight(event, 'evenings');
		const id = eveningIdOf(event.params);
		deleteEvening(id);
		redirect(303, '/evenings');
	}
} satisfies Actions;
