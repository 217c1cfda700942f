import { canAnswerRequests, waitingRequests } from '$lib/server/dances/requests';
import { clubTimeZone } from '$lib/server/evenings/timezone';
import type { LayoutServerLoad } from './$types';

// Every page needs to know who is signed in, to draw the navigation; the pages check rights.
// Those who answer requests see how many wait. Dates and times on every page are written in the
// club's time zone.
export const load = (({ locals }) => ({
	user: locals.user,
	waitingRequests: canAnswerRequests(locals.user) ? waitingRequests() : 0,
	timeZone: clubTimeZone()
})) satisfies LayoutServerLoad;
