import { publicRoute } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	publicRoute(event);
	return {};
}) satisfies PageServerLoad;
