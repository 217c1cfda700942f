// Every API route × every role: who is let through. Kept beside the end-to-end tests and read
// by two checks: tests/role-matrix.spec.ts calls each route as each demo role and as a
// signed-out visitor; src/routes/route-coverage.test.ts fails when a +server.ts route exists
// that this table does not list. Add a row with every new route.
//
// `allowed`: roles that get through (any answer but 401/403 and never a 5xx; a body that is
// deliberately incomplete may give 4xx validation errors, which still proves the gate opened).
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
	/** JSON body to send; mutating calls use a harmless or invalid body. */
	body?: unknown;
}

const TEAM = ['admin', 'organiser', 'dj', 'instructor'] as const;

export const MATRIX: MatrixRow[] = [
	{
		method: 'GET',
		route: '/healthz',
		path: '/healthz',
		allowed: 'everyone signed in',
		public: true
	},
	{ method: 'GET', route: '/api/me', path: '/api/me', allowed: 'everyone signed in' },
	{ method: 'GET', route: '/api/people', path: '/api/people', allowed: ['admin'] },
	{
		method: 'POST',
		route: '/api/invitations',
		path: '/api/invitations',
		allowed: ['admin'],
		body: { email: 'not-an-email' }
	}
];

export { TEAM };
