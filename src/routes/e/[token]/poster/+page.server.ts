import { error } from '@sveltejs/kit';
import { publicRoute } from '$lib/server/guard';
import { publicEvening } from '$lib/server/share/public-evening';
import { qrDataUrl } from '$lib/server/share/qr';
import { publicView } from '../public-view';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	publicRoute(event);
	const evening = publicEvening(event.params.token);
	if (!evening) {
		error(404, { message: 'This evening is not published (or the link is out of date).' });
	}
	const { title, venue, date, from, to, shareUrl } = publicView(evening);
	return { poster: { title, venue, date, from, to, shareUrl }, qr: await qrDataUrl(shareUrl) };
}) satisfies PageServerLoad;
