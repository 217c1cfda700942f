import { expect, request as newRequest, test, type APIRequestContext } from '@playwright/test';
import { BASE, ROLES, signInApi, type DemoRole } from './helpers';
import { MATRIX } from './route-matrix';

// Rights come from DESIGN.md's table of roles; the matrix in ./route-matrix.ts spells them out.
const contexts = new Map<DemoRole | 'anon', APIRequestContext>();

test.beforeAll(async () => {
	contexts.set('anon', await newRequest.newContext({ baseURL: BASE }));
	for (const role of ROLES) {
		const ctx = await newRequest.newContext({ baseURL: BASE });
		await signInApi(ctx, role);
		contexts.set(role, ctx);
	}
});

test.afterAll(async () => {
	for (const ctx of contexts.values()) await ctx.dispose();
});

for (const row of MATRIX) {
	test(`${row.method} ${row.path}`, async () => {
		for (const who of ['anon', ...ROLES] as const) {
			const ctx = contexts.get(who)!;
			const res = await ctx.fetch(row.path, {
				method: row.method,
				data: row.body,
				headers: { origin: BASE, accept: 'application/json' },
				maxRedirects: 0
			});
			const status = res.status();
			const label = `${row.method} ${row.path} as ${who} → ${status}`;
			expect(status, label).toBeLessThan(500);
			const allowed =
				row.allowed === 'everyone signed in'
					? who !== 'anon' || row.public
					: who !== 'anon' &&
						(row.allowed as readonly string[]).some((r) => r === who || who === 'admin');
			if (allowed) {
				expect(status, label).toBe(row.status);
			} else if (who === 'anon') {
				expect(status, label).toBe(401);
			} else {
				expect(status, label).toBe(403);
			}
			if (status === 401 || status === 403) {
				expect(typeof (await res.json()).error, `${label} has an error message`).toBe('string');
			}
		}
	});
}
