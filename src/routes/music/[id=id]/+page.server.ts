import { error, fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { holds, requireRight } from '$lib/server/guard';
import { deleteTrack, getTrack } from '$lib/server/tracks';
import { trackUsage } from '$lib/server/tracks/usage';
import { idParam } from '$lib/route-id';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const track = id === null ? null : getTrack(id);
	if (!track) error(404, 'No such track.');
	const canEdit = holds(user, 'tracks');
	return {
		track,
		canEdit,
		canJudge: holds(user, 'fits'),
		// Said before a removal, to the people who may remove.
		usage: canEdit ? trackUsage(track.id) : null
	};
}) satisfies PageServerLoad;

/** The box a person ticks to say they mean it: a removal cannot be undone. */
const removal = z.object({
	confirm: z.literal('yes', { message: 'Tick the box to say the track should go for good.' })
});

export const actions = {
	remove: async (event) => {
		requireRight(event, 'tracks');
		const id = idParam(event.params.id);
		if (id === null) error(404, 'No such track.');
		const parsed = removal.safeParse(Object.fromEntries(await event.request.formData()));
		if (!parsed.success) return fail(400, { removeMessage: parsed.error.issues[0]?.message });
		const title = getTrack(id)?.title;
		if (!title || !(await deleteTrack(id))) error(404, 'No such track.');
		redirect(303, `/music?removed=${encodeURIComponent(title)}`);
	}
} satisfies Actions;
