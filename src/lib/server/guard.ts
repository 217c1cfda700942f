// Rights, checked in one place. Every load, action and API route calls one of these first.
import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import type { Role } from '../domain';
import type { SessionUser } from './users';

/** Who may change what (DESIGN.md, "People and roles"); admin may do everything. */
export const RIGHTS = {
	people: ['admin'],
	outbox: ['admin'],
	tracks: ['dj'],
	readMusic: ['dj', 'instructor', 'organiser'],
	fits: ['dj', 'instructor'],
	dances: ['instructor'],
	readDances: ['dj', 'instructor', 'organiser', 'dancer'],
	evenings: ['organiser'],
	readEvenings: ['organiser', 'dj', 'instructor', 'dancer'],
	playNight: ['organiser', 'dj'],
	requests: ['organiser', 'dj', 'instructor', 'dancer']
} as const satisfies Record<string, readonly Role[]>;

export type Right = keyof typeof RIGHTS;

export const isApi = (event: Pick<RequestEvent, 'url'>) =>
	event.url.pathname === '/api' || event.url.pathname.startsWith('/api/');

export function holds(user: SessionUser | null, right: Right): boolean {
	if (!user) return false;
	if (user.roles.includes('admin')) return true;
	return (RIGHTS[right] as readonly Role[]).some((r) => user.roles.includes(r));
}

function deny(status: 401 | 403, message: string): never {
	error(status, { message, error: message });
}

/** The signed-in person, or a redirect to sign-in (pages) / 401 (API). */
export function requireUser(event: Pick<RequestEvent, 'locals' | 'url'>): SessionUser {
	const user = event.locals.user;
	if (user) return user;
	if (isApi(event)) deny(401, 'Sign in first.');
	redirect(303, `/signin?redirectTo=${encodeURIComponent(event.url.pathname + event.url.search)}`);
}

/** The signed-in person holding the right, or 401/redirect, or 403. */
export function requireRight(
	event: Pick<RequestEvent, 'locals' | 'url'>,
	right: Right
): SessionUser {
	const user = requireUser(event);
	if (!holds(user, right)) deny(403, 'Your roles do not allow this.');
	return user;
}

/** For routes open to everyone (the public evening page, health); says so explicitly. */
export function publicRoute(_event: Pick<RequestEvent, 'url'>): void {}
