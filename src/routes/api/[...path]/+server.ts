// Any API path no route matches (an id that is not one, a misspelt name): a 404 in the API's own
// shape, `{ error }`, rather than the HTML error page.
import { json } from '@sveltejs/kit';
import { publicRoute } from '$lib/server/guard';
import type { RequestHandler } from './$types';

export const fallback = ((event) => {
	publicRoute(event);
	return json({ error: 'There is no such thing here.' }, { status: 404 });
}) satisfies RequestHandler;
