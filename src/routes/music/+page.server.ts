import { holds, requireRight } from '$lib/server/guard';
import { danceChoices } from '$lib/server/tracks/dance-choices';
import type { PageServerLoad } from './$types';

// The tracks themselves are fetched by the page from /api/tracks (see src/lib/music/library.svelte.ts).
export const load = ((event) => {
	const user = requireRight(event, 'readMusic');
	return {
		dances: danceChoices(),
		canEdit: holds(user, 'tracks'),
		canJudge: holds(user, 'fits')
	};
}) satisfies PageServerLoad;
