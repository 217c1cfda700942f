// Every page and form action × every role: who is let in, by DESIGN.md's table of roles.
// tests/page-matrix.spec.ts visits each as each demo role and signed out;
// src/routes/route-coverage.test.ts fails when a page or action exists that is not listed.
//
// allowed: roles that get the page (2xx, or a redirect that is not to sign-in); other signed-in
// roles get 403 (or `denied`, e.g. 404 where a dancer must not learn a draft exists); signed-out
// visitors are sent to sign-in, unless the page is public.
import type { DemoRole } from './helpers';

export type Allowed = readonly DemoRole[] | 'everyone signed in' | 'public';

export interface PageRow {
	route: string;
	path: string;
	allowed: Allowed;
	denied?: number;
}

export interface ActionRow {
	route: string;
	/** The action's name, or 'default'. */
	action: string;
	path: string;
	allowed: Allowed;
}

const TEAM_READERS = ['dj', 'instructor', 'organiser'] as const;

export const PAGES: PageRow[] = [
	{ route: '/', path: '/', allowed: 'public' },
	{ route: '/signin', path: '/signin', allowed: 'public' },
	{ route: '/signin/forgot', path: '/signin/forgot', allowed: 'public' },
	{ route: '/reset/[token]', path: '/reset/not-a-real-reset-token-12345', allowed: 'public' },
	{ route: '/safe-floors', path: '/safe-floors', allowed: 'public' },
	{ route: '/invite/[token]', path: '/invite/not-a-real-invitation-token-123', allowed: 'public' },
	{ route: '/e/[token]', path: '/e/{share}', allowed: 'public' },
	{ route: '/e/[token]/poster', path: '/e/{share}/poster', allowed: 'public' },
	{ route: '/admin/people', path: '/admin/people', allowed: ['admin'] },
	{ route: '/admin/outbox', path: '/admin/outbox', allowed: ['admin'] },
	{ route: '/music', path: '/music', allowed: TEAM_READERS },
	{ route: '/music/[id=id]', path: '/music/1', allowed: TEAM_READERS },
	{ route: '/dances', path: '/dances', allowed: 'everyone signed in' },
	{ route: '/dances/[id=id]', path: '/dances/1', allowed: 'everyone signed in' },
	{ route: '/dances/new', path: '/dances/new', allowed: ['instructor'] },
	{ route: '/dances/[id=id]/edit', path: '/dances/1/edit', allowed: ['instructor'] },
	{ route: '/dances/import', path: '/dances/import', allowed: ['instructor'] },
	{ route: '/evenings', path: '/evenings', allowed: 'everyone signed in' },
	// Evening 1 is published (dancers may read it); evening 2 is a draft.
	{ route: '/evenings/[id=id]', path: '/evenings/1', allowed: 'everyone signed in' },
	{ route: '/evenings/[id=id]', path: '/evenings/2', allowed: TEAM_READERS, denied: 404 },
	{ route: '/evenings/[id=id]/desk', path: '/evenings/1/desk', allowed: 'everyone signed in' },
	{ route: '/evenings/[id=id]/print', path: '/evenings/1/print', allowed: 'everyone signed in' },
	{ route: '/evenings/new', path: '/evenings/new', allowed: ['organiser'] },
	{ route: '/evenings/[id=id]/edit', path: '/evenings/1/edit', allowed: ['organiser'] },
	// A dancer sees only their own requests there (src/lib/server/dances/requests.ts).
	{ route: '/requests', path: '/requests', allowed: 'everyone signed in' }
];

// Actions are posted with an empty form: the allowed get a validation answer, never a change.
export const ACTIONS: ActionRow[] = [
	{ route: '/signin', action: 'default', path: '/signin', allowed: 'public' },
	{ route: '/signin/forgot', action: 'default', path: '/signin/forgot', allowed: 'public' },
	{
		route: '/reset/[token]',
		action: 'default',
		path: '/reset/not-a-real-reset-token-12345',
		allowed: 'public'
	},
	{ route: '/signout', action: 'default', path: '/signout', allowed: 'public' },
	{
		route: '/invite/[token]',
		action: 'default',
		path: '/invite/not-a-real-invitation-token-123',
		allowed: 'public'
	},
	{ route: '/e/[token]', action: 'request', path: '/e/{share}', allowed: 'public' },
	{ route: '/admin/people', action: 'invite', path: '/admin/people', allowed: ['admin'] },
	{ route: '/admin/people', action: 'roles', path: '/admin/people', allowed: ['admin'] },
	{ route: '/admin/people', action: 'withdraw', path: '/admin/people', allowed: ['admin'] },
	{ route: '/admin/people', action: 'resend', path: '/admin/people', allowed: ['admin'] },
	{ route: '/admin/people', action: 'cancel', path: '/admin/people', allowed: ['admin'] },
	// An empty form is refused (400) before anything goes: the box is not ticked.
	{ route: '/music/[id=id]', action: 'remove', path: '/music/1', allowed: ['dj'] },
	{ route: '/dances/new', action: 'save', path: '/dances/new', allowed: ['instructor'] },
	{
		route: '/dances/[id=id]/edit',
		action: 'save',
		path: '/dances/1/edit',
		allowed: ['instructor']
	},
	{
		route: '/dances/[id=id]/edit',
		action: 'delete',
		path: '/dances/999999/edit',
		allowed: ['instructor']
	},
	{ route: '/dances/[id=id]', action: 'verdict', path: '/dances/1', allowed: ['dj', 'instructor'] },
	{ route: '/dances/[id=id]', action: 'request', path: '/dances/1', allowed: ['instructor'] },
	{ route: '/dances/import', action: 'preview', path: '/dances/import', allowed: ['instructor'] },
	{ route: '/dances/import', action: 'import', path: '/dances/import', allowed: ['instructor'] },
	{ route: '/evenings/new', action: 'default', path: '/evenings/new', allowed: ['organiser'] },
	{
		route: '/evenings/[id=id]/edit',
		action: 'save',
		path: '/evenings/1/edit',
		allowed: ['organiser']
	},
	{
		route: '/evenings/[id=id]/edit',
		action: 'delete',
		path: '/evenings/999999/edit',
		allowed: ['organiser']
	},
	{ route: '/requests', action: 'answer', path: '/requests', allowed: ['organiser', 'dj'] }
];
