import { requireRight } from '$lib/server/guard';
import { editsEvenings, readsDrafts } from '$lib/server/evenings/access';
import { listEvenings } from '$lib/server/evenings/load';
import { clubTimeZone } from '$lib/server/evenings/timezone';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readEvenings');
	return {
		evenings: listEvenings(!readsDrafts(user)),
		canEdit: editsEvenings(user),
		timeZone: clubTimeZone()
	};
}) satisfies PageServerLoad;
