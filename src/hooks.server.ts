import { building } from '$app/environment';
import { json, type Handle, type ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { handle as authHandle } from './auth';
import { cachePublicPages } from '$lib/server/cache/public-pages';
import { closeDb, db } from '$lib/server/db';
import { closePlanPool } from '$lib/server/evenings/plan-pool';
import { isApi } from '$lib/server/guard';
import { startCatcher, stopCatcher } from '$lib/server/mail/catcher';
import { mailIsCaptured } from '$lib/server/mail/send';
import { describeSweep, sweepOrphans } from '$lib/server/sweep';
import { sessionUser } from '$lib/server/users';
import { config } from '$lib/server/config';
import { isCrossSiteWrite } from '$lib/server/same-origin';
import { startProblems } from '$lib/server/start-check';
import { sessionCookieNames } from '$lib/server/session-cookie';

export const init: ServerInit = async () => {
	if (building) return;
	const { fatal, warnings } = startProblems(process.env);
	for (const w of warnings) console.warn(`Floorset: ${w}`);
	if (fatal.length) {
		for (const f of fatal) console.error(`Floorset cannot start: ${f}`);
		process.exit(1);
	}
	db();
	const swept = describeSweep(await sweepOrphans());
	if (swept) console.log(swept);
	if (mailIsCaptured()) await startCatcher();
	// adapter-node stops serving on SIGTERM/SIGINT, then waits for the event loop to empty: close
	// what we opened (the mail catcher's socket, the database) so the process really exits.
	process.once('sveltekit:shutdown' as 'exit', () => {
		void stopCatcher();
		void closePlanPool();
		closeDb();
	});
};

/**
 * Sign-in goes only through our /signin action, which rate-limits; a direct POST to Auth.js's
 * credentials callback would skip that, so it is refused.
 */
const onlyOurSignIn: Handle = ({ event, resolve }) => {
	const p = event.url.pathname;
	if (event.request.method === 'POST' && /^\/auth\/(callback|signin)\//.test(p)) {
		return new Response('Sign in at /signin.', { status: 404 });
	}
	return resolve(event);
};

/** Who is signed in, as Auth.js reads its cookie (once per request); roles come fresh from the
 * database, and a session issued under an earlier password counts as signed out. */
const session: Handle = async ({ event, resolve }) => {
	// Auth.js's session call sets a callback-url cookie on every answer, which would hand each
	// visitor a cookie and keep the public page out of its cache: ask only when the request
	// carries a session cookie (Auth.js's default names, split ones included).
	const hasSession = sessionCookieNames(event.cookies).length > 0;
	const claim = hasSession
		? ((await event.locals.auth()) as { uid?: unknown; pw?: unknown } | null)
		: null;
	event.locals.user =
		typeof claim?.uid === 'number'
			? sessionUser(claim.uid, typeof claim.pw === 'string' ? claim.pw : null)
			: null;
	return resolve(event);
};

/** Writes only from our own pages (or programs that are not browsers), whatever the body. */
const sameOriginWrites: Handle = ({ event, resolve }) => {
	const own = [event.url.origin, config().origin.replace(/\/$/, '')];
	if (isCrossSiteWrite(event.request.method, event.request.headers, own)) {
		const error = 'Cross-site requests that change data are refused.';
		return isApi(event) ? json({ error }, { status: 403 }) : new Response(error, { status: 403 });
	}
	return resolve(event);
};

/** A first, coarse gate; each route still checks its own right through the guard helper. */
const apiNeedsSession: Handle = ({ event, resolve }) => {
	if (isApi(event) && !event.locals.user && !event.url.pathname.startsWith('/api/public/')) {
		return json({ error: 'Sign in first.' }, { status: 401 });
	}
	return resolve(event);
};

const securityHeaders: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	response.headers.set('X-Content-Type-Options', 'nosniff');
	response.headers.set('Referrer-Policy', 'strict-origin-when-cross-origin');
	response.headers.set('X-Frame-Options', 'DENY');
	response.headers.set('Permissions-Policy', 'camera=(), microphone=(), geolocation=()');
	return response;
};

export const handle = sequence(
	securityHeaders,
	sameOriginWrites,
	onlyOurSignIn,
	authHandle,
	session,
	cachePublicPages,
	apiNeedsSession
);
