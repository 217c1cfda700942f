// Every API route × every role: who is let through. Kept beside the end-to-end tests and read
// by two checks: tests/role-matrix.spec.ts calls each route as each demo role and as a
// signed-out visitor; src/routes/route-coverage.test.ts fails when a +server.ts route exists
// that this table does not list. Add a row with every new route.
//
// `allowed`: roles that get through, each with exactly `status` (a body that is deliberately
// incomplete gives its validation error, an unknown id its 404: proof the gate opened and the
// route itself answered, not a missing route).
// Everyone else signed in must get 403; a signed-out visitor 401 — unless `public` is set.
import type { DemoRole } from './helpers';

export interface MatrixRow {
	method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
	/** The SvelteKit route id, as under src/routes. */
	route: string;
	/** A concrete path to call (ids of the demo data). */
	path: string;
	allowed: readonly DemoRole[] | 'everyone signed in';
	public?: boolean;
	/** The status every allowed role gets: the gate opened and the route answered as it should. */
	status: number;
	/** JSON body to send; mutating calls use a harmless or invalid body. */
	body?: unknown;
}

const TEAM = ['admin', 'organiser', 'dj', 'instructor'] as const;

export const MATRIX: MatrixRow[] = [
	// evenings (issue 5): reads for every role (dancers see published evenings only), writes for
	// organisers; bodies are invalid (422) or ids missing (404) so the matrix changes nothing.
	{
		method: 'GET',
		route: '/api/evenings',
		path: '/api/evenings',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'POST',
		route: '/api/evenings',
		path: '/api/evenings',
		status: 422,
		allowed: ['organiser'],
		body: {}
	},
	{
		method: 'GET',
		route: '/api/evenings/[id=id]',
		path: '/api/evenings/1',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'PATCH',
		route: '/api/evenings/[id=id]',
		path: '/api/evenings/1',
		status: 422,
		allowed: ['organiser'],
		body: { startsAt: 'not a date' }
	},
	{
		method: 'DELETE',
		route: '/api/evenings/[id=id]',
		path: '/api/evenings/999999',
		status: 404,
		allowed: ['organiser']
	},
	{
		method: 'POST',
		route: '/api/evenings/[id=id]/plan',
		path: '/api/evenings/1/plan',
		status: 422,
		allowed: ['organiser'],
		body: { seed: 'not a number' }
	},
	{
		method: 'GET',
		route: '/api/evenings/[id=id]/run-order',
		path: '/api/evenings/1/run-order',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'PUT',
		route: '/api/evenings/[id=id]/run-order',
		path: '/api/evenings/1/run-order',
		status: 409,
		allowed: ['organiser'],
		body: { version: 0, entries: [] }
	},
	{
		method: 'GET',
		route: '/api/evenings/[id=id]/suggestions',
		path: '/api/evenings/1/suggestions?danceId=1',
		status: 200,
		allowed: ['organiser']
	},
	// end of evenings rows
	// Sharing an evening (issue 5, "Getting it to people"): exports are readEvenings (a dancer
	// only for published evenings: demo evening 1 is published); e-mail and publishing are
	// organisers'. Mutations use an empty body (422) or an unknown id (404), so nothing changes.
	// Not in this table, because they are pages, not API routes (tests/page-matrix.ts lists them
	// by role): the public page /e/<token>, its poster and its request form (a form action,
	// ?/request) need no sign-in and are tested in tests/share.spec.ts (signed out: page, QR, no private data, request stored, 404 after
	// unpublishing) and src/lib/server/share/share.test.ts; the print page /evenings/[id=id]/print
	// takes the exports' rights (requireRight 'readEvenings', checked by route-coverage.test.ts).
	...(['csv', 'm3u8', 'pdf', 'ics'] as const).map((ext): MatrixRow => ({
		method: 'GET',
		route: `/api/evenings/[id=id]/export.${ext}`,
		path: `/api/evenings/1/export.${ext}`,
		status: 200,
		allowed: 'everyone signed in'
	})),
	// The evening kit holds the club's audio: organisers and DJs only.
	{
		method: 'GET',
		route: '/api/evenings/[id=id]/kit.zip',
		path: '/api/evenings/1/kit.zip',
		status: 200,
		allowed: ['organiser', 'dj']
	},
	{
		method: 'GET',
		route: '/api/evenings/[id=id]/email',
		path: '/api/evenings/1/email',
		status: 200,
		allowed: ['organiser']
	},
	{
		method: 'POST',
		route: '/api/evenings/[id=id]/email',
		path: '/api/evenings/1/email',
		status: 422,
		allowed: ['organiser'],
		body: {}
	},
	{
		method: 'POST',
		route: '/api/evenings/[id=id]/publish',
		path: '/api/evenings/999999/publish',
		status: 404,
		allowed: ['organiser']
	},
	{
		method: 'DELETE',
		route: '/api/evenings/[id=id]/publish',
		path: '/api/evenings/999999/publish',
		status: 404,
		allowed: ['organiser']
	},
	// end of sharing rows
	// Dance catalogue and fits (issue 4): reading is readDances, changing is dances (instructor),
	// verdicts are fits (dj, instructor). Mutations use an unknown id or an invalid body.
	{
		method: 'GET',
		route: '/api/dances',
		path: '/api/dances?level=beginner',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'POST',
		route: '/api/dances',
		path: '/api/dances',
		status: 422,
		allowed: ['instructor'],
		body: {}
	},
	{
		method: 'GET',
		route: '/api/dances/[id=id]',
		path: '/api/dances/1',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'PATCH',
		route: '/api/dances/[id=id]',
		path: '/api/dances/1',
		status: 422,
		allowed: ['instructor'],
		body: {}
	},
	{
		method: 'DELETE',
		route: '/api/dances/[id=id]',
		path: '/api/dances/999999',
		status: 404,
		allowed: ['instructor']
	},
	{
		method: 'GET',
		// The fits carry the team's verdicts on the whole library (issue 13, finding 10).
		route: '/api/dances/[id=id]/fits',
		path: '/api/dances/1/fits?limit=5',
		status: 200,
		allowed: ['dj', 'instructor', 'organiser']
	},
	{
		method: 'GET',
		route: '/api/dances/[id=id]/sheet',
		path: '/api/dances/1/sheet',
		status: 404,
		allowed: 'everyone signed in'
	},
	{
		method: 'GET',
		route: '/api/dances/export',
		path: '/api/dances/export',
		status: 200,
		allowed: 'everyone signed in'
	},
	{
		method: 'GET',
		route: '/api/tracks/[id=id]/fits',
		path: '/api/tracks/1/fits?limit=5',
		status: 200,
		allowed: ['dj', 'instructor', 'organiser']
	},
	{
		method: 'PUT',
		route: '/api/fits',
		path: '/api/fits',
		status: 422,
		allowed: ['dj', 'instructor'],
		body: {}
	},
	{
		method: 'DELETE',
		route: '/api/fits',
		path: '/api/fits',
		status: 422,
		allowed: ['dj', 'instructor'],
		body: {}
	},
	// end of dance catalogue and fits rows
	{
		method: 'GET',
		route: '/healthz',
		path: '/healthz',
		status: 200,
		allowed: 'everyone signed in',
		public: true
	},
	// Signed play links (issue 12): no session; a link without its tag is refused with 400.
	{
		method: 'GET',
		route: '/api/public/play/[evening=id]/[track=id]',
		path: '/api/public/play/1/1',
		status: 400,
		allowed: 'everyone signed in',
		public: true
	},
	// Paths no route matches (here an id that is not one) answer 404 as JSON; signed out, the
	// hooks' 401 comes first.
	...(['GET', 'POST', 'DELETE'] as const).map((method): MatrixRow => ({
		method,
		route: '/api/[...path]',
		path: '/api/tracks/not-an-id',
		status: 404,
		allowed: 'everyone signed in'
	})),
	{ method: 'GET', route: '/api/me', path: '/api/me', status: 200, allowed: 'everyone signed in' },
	{ method: 'GET', route: '/api/people', path: '/api/people', status: 200, allowed: ['admin'] },
	{
		method: 'POST',
		route: '/api/invitations',
		path: '/api/invitations',
		status: 422,
		allowed: ['admin'],
		body: { email: 'not-an-email' }
	},
	// Music library (issue 3): reading is readMusic (dj, instructor, organiser), changing is tracks (dj).
	{
		method: 'GET',
		route: '/api/tracks',
		path: '/api/tracks?limit=5',
		status: 200,
		allowed: ['dj', 'instructor', 'organiser']
	},
	{
		method: 'POST',
		route: '/api/tracks',
		path: '/api/tracks',
		status: 415,
		allowed: ['dj'],
		body: { not: 'multipart' }
	},
	{
		method: 'GET',
		route: '/api/tracks/[id=id]',
		path: '/api/tracks/1',
		status: 200,
		allowed: ['dj', 'instructor', 'organiser']
	},
	{
		method: 'PATCH',
		route: '/api/tracks/[id=id]',
		path: '/api/tracks/1',
		status: 422,
		allowed: ['dj'],
		body: {}
	},
	// A track id that does not exist, so the allowed roles get 404 and nothing is deleted.
	{
		method: 'DELETE',
		route: '/api/tracks/[id=id]',
		path: '/api/tracks/999999',
		status: 404,
		allowed: ['dj']
	},
	{
		method: 'GET',
		route: '/api/tracks/[id=id]/audio',
		path: '/api/tracks/1/audio',
		status: 200,
		allowed: ['dj', 'instructor', 'organiser']
	}
	// end of music library rows
];

export { TEAM };
