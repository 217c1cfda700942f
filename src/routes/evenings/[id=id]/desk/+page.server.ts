import { error } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { mayRead } from '$lib/server/evenings/access';
import { loadEvening } from '$lib/server/evenings/load';
import { eveningIdOf } from '$lib/server/evenings/respond';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const evening = loadEvening(eveningIdOf(event.params));
	if (!evening || !mayRead(user, evening)) error(404, { message: 'There is no such evening.' });
	return { evening };
}) satisfies PageServerLoad;
