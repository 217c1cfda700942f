// Auth.js's session cookie by its default names (a long one is split into `.0`, `.1`, …), so the
// hooks know when there is a session to ask Auth.js about, and a page served from the cache can
// still clear a cookie nobody could read.

export const SESSION_COOKIE = /^(__Secure-)?authjs\.session-token(\.\d+)?$/;

export const sessionCookieNames = (cookies: { getAll(): { name: string }[] }) =>
	cookies
		.getAll()
		.map((c) => c.name)
		.filter((name) => SESSION_COOKIE.test(name));

/** Set-Cookie values that delete these cookies (expired at once, RFC 6265 §5.3). */
export const clearing = (names: string[]) =>
	names.map(
		(name) =>
			`${name}=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax${name.startsWith('__Secure-') ? '; Secure' : ''}`
	);
