import { expect, test } from 'vitest';
import { clearing, sessionCookieNames } from './session-cookie';

test("Auth.js's session cookie by its default names, split ones included, and nothing else", () => {
	const names = sessionCookieNames({
		getAll: () =>
			[
				'authjs.session-token',
				'__Secure-authjs.session-token.0',
				'authjs.callback-url',
				'floorset-device'
			].map((name) => ({ name }))
	});
	expect(names).toEqual(['authjs.session-token', '__Secure-authjs.session-token.0']);
	// RFC 6265 §5.3: Max-Age=0 deletes the cookie; a __Secure- cookie must be set with Secure.
	expect(clearing(names)).toEqual([
		'authjs.session-token=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax',
		'__Secure-authjs.session-token.0=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax; Secure'
	]);
});
