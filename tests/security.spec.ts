import { expect, test } from '@playwright/test';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { BASE } from './helpers';

test('pages carry a Content-Security-Policy, nosniff and a Referrer-Policy', async ({
	request
}) => {
	const res = await request.get('/signin');
	const h = res.headers();
	expect(h['content-security-policy']).toContain("default-src 'self'");
	expect(h['content-security-policy']).toContain("object-src 'none'");
	expect(h['content-security-policy']).toContain("frame-ancestors 'none'");
	expect(h['x-content-type-options']).toBe('nosniff');
	expect(h['referrer-policy']).toBe('strict-origin-when-cross-origin');
});

test('the session cookie is httpOnly and SameSite=Lax, and not Secure-only on plain http', async ({
	request
}) => {
	const res = await request.post('/signin', {
		form: {
			providerId: 'credentials',
			email: 'dj@floorset.test',
			password: 'floorset-demo',
			redirectTo: '/'
		},
		headers: { origin: BASE, accept: 'text/html' },
		maxRedirects: 0
	});
	const cookie = res
		.headersArray()
		.filter((h) => h.name.toLowerCase() === 'set-cookie')
		.map((h) => h.value)
		.find((v) => v.startsWith('authjs.session-token='));
	expect(cookie, 'a session cookie was set').toBeTruthy();
	expect(cookie).toMatch(/; HttpOnly/i);
	expect(cookie).toMatch(/; SameSite=Lax/i);
	// The tests serve plain http, so the cookie must not be Secure-only here (browsers would drop
	// it); with an https ORIGIN, Auth.js adds Secure and the __Secure- prefix (src/auth.ts).
	expect(cookie).not.toMatch(/; Secure/i);
});

test('a cross-site form POST is refused by the origin check', async ({ request }) => {
	const res = await request.post('/signin', {
		form: { email: 'dj@floorset.test', password: 'floorset-demo' },
		headers: { origin: 'http://evil.example' }
	});
	expect(res.status()).toBe(403);
});

test('a direct POST to the Auth.js callback (skipping the sign-in limit) is refused', async ({
	request
}) => {
	const res = await request.post('/auth/callback/credentials', {
		form: { email: 'dj@floorset.test', password: 'floorset-demo' },
		headers: { origin: BASE }
	});
	expect(res.status()).toBe(404);
});

test('no secret or server-only code reaches the client bundle', async () => {
	const dir = join(process.env.FLOORSET_BUILD_DIR ?? 'build', 'client');
	const walk = (d: string): string[] =>
		readdirSync(d, { withFileTypes: true }).flatMap((e) =>
			e.isDirectory() ? walk(join(d, e.name)) : [join(d, e.name)]
		);
	const files = walk(dir).filter((f) => /\.(js|css|html|json)$/.test(f));
	expect(files.length).toBeGreaterThan(5);
	const forbidden = [
		'e2e-only-secret-not-for-production', // the AUTH_SECRET the test server runs with
		'AUTH_SECRET',
		'SMTP_PASS',
		'password_hash',
		'better-sqlite3',
		'@node-rs/argon2',
		'floorset-demo' // the demo password is documented, but never shipped to browsers
	];
	for (const file of files) {
		const text = readFileSync(file, 'utf8');
		for (const word of forbidden) expect(text.includes(word), `${word} in ${file}`).toBe(false);
	}
});
