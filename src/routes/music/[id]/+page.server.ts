import { error } from '@sveltejs/kit';
import { holds, requireRight } from '$lib/server/guard';
import { getTrack } from '$lib/server/tracks';
import { trackId } from '../../api/tracks/[id]/track-id';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readMusic');
	const id = trackId(event.params.id);
	const track = id === null ? null : getTrack(id);
	if (!track) error(404, 'No such track.');
	return { track, canEdit: holds(user, 'tracks'), canJudge: holds(user, 'fits') };
}) satisfies PageServerLoad;
