import { error } from '@sveltejs/kit';
import { holds, requireRight } from '$lib/server/guard';
import { getTrack } from '$lib/server/tracks';
import { idParam } from '$lib/route-id';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const track = id === null ? null : getTrack(id);
	if (!track) error(404, 'No such track.');
	return { track, canEdit: holds(user, 'tracks'), canJudge: holds(user, 'fits') };
}) satisfies PageServerLoad;
