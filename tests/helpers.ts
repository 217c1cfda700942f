// Shared by the end-to-end tests: the demo accounts and signing in as one of them.
import { expect, type APIRequestContext, type Page } from '@playwright/test';

/** The app's origin, for the Origin header SvelteKit's cross-site check wants on POSTs. */
export const BASE = `http://127.0.0.1:${process.env.E2E_PORT ?? 4173}`;

export const DEMO_PASSWORD = 'floorset-demo';
export const ROLES = ['admin', 'organiser', 'dj', 'instructor', 'dancer'] as const;
export type DemoRole = (typeof ROLES)[number];
export const emailOf = (role: DemoRole) => `${role}@floorset.test`;

/**
 * Waits until the page's scripts have taken over the server's HTML (the mark is set in
 * src/routes/+layout.svelte). Before that, Svelte resets fields written as `value={…}` and
 * `onclick` handlers are not there yet, so typing or clicking may be lost. After a navigation,
 * first check something only the new page has, or the old page's mark will do.
 */
export const hydrated = (page: Page) => expect(page.locator('html[data-hydrated]')).toBeAttached();

export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD) {
	await page.goto('/signin');
	await hydrated(page);
	await page.getByLabel('E-mail').fill(emailOf(role));
	await page.getByLabel('Password').fill(password);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
}

/** Signs an API request context in through the same form a person uses. */
export async function signInApi(request: APIRequestContext, role: DemoRole) {
	const res = await request.post('/signin', {
		form: {
			providerId: 'credentials',
			email: emailOf(role),
			password: DEMO_PASSWORD,
			redirectTo: '/'
		},
		headers: { origin: BASE, accept: 'text/html' },
		maxRedirects: 0
	});
	expect([200, 302, 303]).toContain(res.status());
	const me = await request.get('/api/me');
	expect(me.status()).toBe(200);
}
