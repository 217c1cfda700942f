import { json } from '@sveltejs/kit';
import { config } from '$lib/server/config';
import { requireRight } from '$lib/server/guard';
import { eveningId, notFound } from '$lib/server/share/access';
import { shareUrlOf } from '$lib/server/share/load-sheet';
import { publishEvening, unpublishEvening } from '$lib/server/share/publish';
import type { RequestHandler } from './$types';

/** Publishes the evening (keeping an existing link) and answers its public page's address. */
export const POST = ((event) => {
	requireRight(event, 'evenings');
	const token = publishEvening(eveningId(event.params.id));
	if (!token) notFound();
	return json({ shareUrl: shareUrlOf(config().origin, token) });
}) satisfies RequestHandler;

/** Back to draft: the token is cleared, so the old public link answers 404. */
export const DELETE = ((event) => {
	requireRight(event, 'evenings');
	if (!unpublishEvening(eveningId(event.params.id))) notFound();
	return json({ published: false, shareUrl: null });
}) satisfies RequestHandler;
