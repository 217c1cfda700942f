import { requireRight } from '$lib/server/guard';
import { readableSheet } from '$lib/server/share/access';
import { sheetView } from '$lib/server/share/sheet-view';
import type { PageServerLoad } from './$types';

// The same rights as the exports: the team, or a dancer for a published evening.
export const load = ((event) => {
	const sheet = readableSheet(requireRight(event, 'readEvenings'), event.params.id);
	return { sheet: sheetView(sheet) };
}) satisfies PageServerLoad;
