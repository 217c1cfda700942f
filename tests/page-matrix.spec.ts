import { expect, request as newRequest, test, type APIRequestContext } from '@playwright/test';
import { BASE, ROLES, signInApi, type DemoRole } from './helpers';
import { ACTIONS, PAGES, type Allowed } from './page-matrix';

// Rights come from DESIGN.md's table of roles; ./page-matrix.ts spells them out per page.
const contexts = new Map<DemoRole | 'anon', APIRequestContext>();
let share = '';

async function signInEveryone() {
	for (const ctx of contexts.values()) await ctx.dispose();
	contexts.set('anon', await newRequest.newContext({ baseURL: BASE }));
	for (const role of ROLES) {
		const ctx = await newRequest.newContext({ baseURL: BASE });
		await signInApi(ctx, role);
		contexts.set(role, ctx);
	}
}

test.beforeAll(async () => {
	await signInEveryone();
	const evening = await (await contexts.get('organiser')!.get('/api/evenings/1')).json();
	share = evening.shareToken ?? 'no-share-token';
});
test.afterAll(async () => {
	for (const ctx of contexts.values()) await ctx.dispose();
});

const WHO = ['anon', ...ROLES] as const;
const lets = (allowed: Allowed, who: (typeof WHO)[number]) =>
	allowed === 'public' ||
	(who !== 'anon' &&
		(allowed === 'everyone signed in' || who === 'admin' || allowed.includes(who)));

for (const row of PAGES) {
	test(`page ${row.path}`, async () => {
		for (const who of WHO) {
			const path = row.path.replace('{share}', share);
			const res = await contexts.get(who)!.get(path, {
				headers: { accept: 'text/html' },
				maxRedirects: 0
			});
			const status = res.status();
			const location = res.headers()['location'] ?? '';
			const label = `${path} as ${who} → ${status} ${location}`;
			expect(status, label).toBeLessThan(500);
			if (lets(row.allowed, who)) {
				expect([401, 403], label).not.toContain(status);
				if (row.allowed !== 'public') expect(location, label).not.toMatch(/^\/signin/);
			} else if (who === 'anon') {
				expect(status, label).toBe(303);
				expect(location, label).toMatch(/^\/signin\?redirectTo=/);
			} else {
				expect(status, label).toBe(row.denied ?? 403);
			}
		}
	});
}

for (const row of ACTIONS) {
	test(`action ${row.path} ?/${row.action}`, async () => {
		for (const who of WHO) {
			const base = row.path.replace('{share}', share);
			const path = row.action === 'default' ? base : `${base}?/${row.action}`;
			const res = await contexts.get(who)!.post(path, {
				form: {},
				headers: { origin: BASE, accept: 'application/json', 'x-sveltekit-action': 'true' },
				maxRedirects: 0
			});
			const text = await res.text();
			// SvelteKit answers an enhanced action with {type, status}; a thrown error() is type 'error'.
			let status = res.status();
			let location = '';
			try {
				const body = JSON.parse(text);
				status = body.status ?? status;
				location = body.location ?? '';
			} catch {
				/* not JSON: keep the HTTP status */
			}
			const label = `POST ${path} as ${who} → ${status} ${location}`;
			expect(status, label).toBeLessThan(500);
			if (lets(row.allowed, who)) {
				expect([401, 403], label).not.toContain(status);
			} else if (who === 'anon') {
				expect(status === 401 || (status === 303 && location.startsWith('/signin')), label).toBe(
					true
				);
			} else {
				expect(status, label).toBe(403);
			}
		}
		// Signing out ends the sessions the other rows need.
		if (row.route === '/signout') await signInEveryone();
	});
}
