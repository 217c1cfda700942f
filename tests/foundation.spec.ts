import { expect, test, type Browser, type Page } from '@playwright/test';
import { signIn, type DemoRole, hydrated } from './helpers';

// What each demo role should see in the main navigation (DESIGN.md, "People and roles").
const NAV: Record<DemoRole, string[]> = {
	admin: ['Music', 'Dances', 'Evenings', 'Requests', 'People', 'Outbox'],
	organiser: ['Music', 'Dances', 'Evenings', 'Requests'],
	dj: ['Music', 'Dances', 'Evenings', 'Requests'],
	instructor: ['Music', 'Dances', 'Evenings', 'Requests'],
	dancer: ['Dances', 'Evenings', 'Requests']
};

for (const [role, labels] of Object.entries(NAV) as [DemoRole, string[]][]) {
	test(`${role} signs in and sees their navigation`, async ({ page }) => {
		await signIn(page, role);
		const nav = page.getByRole('navigation', { name: 'Main' });
		// "Requests" may carry the count of requests waiting for an answer.
		await expect(nav.getByRole('link')).toHaveText(
			labels.map((l) => new RegExp(`^${l}(\\s*\\d+\\s*waiting)?$`))
		);
	});
}

test('a dancer opening an organiser page gets the 403 page', async ({ page }) => {
	await signIn(page, 'dancer');
	const response = await page.goto('/admin/people');
	expect(response?.status()).toBe(403);
	await expect(page.getByTestId('error-page')).toContainText('Not for your roles');
});

test('signed out, a page redirects to sign-in and the API answers 401 JSON', async ({
	page,
	request
}) => {
	await page.goto('/admin/outbox');
	await hydrated(page);
	await expect(page).toHaveURL(/\/signin\?redirectTo=%2Fadmin%2Foutbox/);
	const res = await request.get('/api/me');
	expect(res.status()).toBe(401);
	expect(await res.json()).toEqual({ error: 'Sign in first.' });
});

test('a wrong password gets one message that does not tell whether the account exists', async ({
	page
}) => {
	for (const email of ['organiser@floorset.test', 'nobody-here@floorset.test']) {
		await page.goto('/signin');
		await hydrated(page);
		await page.getByLabel('E-mail').fill(email);
		await page.getByLabel('Password').fill('not the password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('alert')).toHaveText(
			'That e-mail and password do not match an account.'
		);
	}
});

/**
 * An admin (signed in on `page`) invites a dancer, who sets a password from the e-mailed link and
 * signs in on a page of their own, which is returned with the link.
 */
async function inviteAndJoin(page: Page, browser: Browser, name: string, email: string) {
	await page.goto('/admin/people');
	await hydrated(page);
	await page.getByLabel('Name').fill(name);
	await page.getByLabel('E-mail').fill(email);
	// A dancer, so the team's DJ and instructor counts other tests rely on stay as seeded.
	await page.getByRole('button', { name: 'Send invitation' }).click();
	await expect(page.getByRole('status')).toContainText(`Invitation sent to ${email}`);

	await page.goto('/admin/outbox');
	await hydrated(page);
	const message = page.getByTestId('outbox-message').filter({ hasText: email }).first();
	await message.locator('summary').click();
	const body = await message.locator('pre').innerText();
	const link = body.match(/https?:\/\/\S+\/invite\/\S+/)?.[0];
	expect(link, 'the invitation e-mail carries a link').toBeTruthy();
	// The link in the message can be opened from the outbox (issue 15).
	await expect(message.locator('pre a', { hasText: '/invite/' })).toHaveAttribute('href', link!);

	const guest = await browser.newPage();
	await guest.goto(link!);
	await hydrated(guest);
	await guest.getByLabel('New password').fill('a-long-new-password');
	await guest.getByLabel('The same again').fill('a-long-new-password');
	await guest.getByRole('button', { name: 'Set password' }).click();
	await expect(guest).toHaveURL(/\/signin/);
	await hydrated(guest);
	await guest.getByLabel('E-mail').fill(email);
	await guest.getByLabel('Password').fill('a-long-new-password');
	await guest.getByRole('button', { name: 'Sign in' }).click();
	await expect(guest.getByTestId('who')).toContainText(`${name} · Dancer`);
	// A dancer's home page speaks to dancers, not to the team that runs the night.
	await guest.goto('/');
	await expect(guest.getByText('ask the DJ for a dance you would like to hear')).toBeVisible();
	await expect(guest.getByText('Plan the run order')).toHaveCount(0);
	return { guest, link: link! };
}

test('an admin invites someone, who sets a password from the e-mailed link and signs in', async ({
	page,
	browser
}) => {
	await signIn(page, 'admin');
	const { guest, link } = await inviteAndJoin(
		page,
		browser,
		'Ada Newcombe',
		`newcomer-${Date.now()}@floorset.test`
	);

	// The link works once.
	const again = await guest.goto(link);
	expect(again?.status()).toBe(404);

	await guest.getByRole('button', { name: 'Sign out' }).click();
	await expect(guest.getByRole('link', { name: 'Sign in' })).toBeVisible();
	await guest.close();
});

test('an admin withdraws access: the person is signed out at once and cannot sign in again', async ({
	page,
	browser
}) => {
	const email = `leaver-${Date.now()}@floorset.test`;
	await signIn(page, 'admin');
	const { guest } = await inviteAndJoin(page, browser, 'Tam Leaver', email);

	await page.goto('/admin/people');
	await hydrated(page);
	const row = page.getByRole('listitem').filter({ hasText: email });
	await row.getByText('Withdraw access…').click();
	await row.getByRole('button', { name: "Withdraw Tam Leaver's access" }).click();
	await expect(page.getByRole('status')).toHaveText('Access withdrawn.');
	await expect(row).toContainText(`${email} · no access`);
	await expect(row.getByText('Withdraw access…')).toHaveCount(0);

	// The session they hold grants nothing from the next request on.
	await guest.goto('/evenings');
	await hydrated(guest);
	await expect(guest).toHaveURL(/\/signin/);
	await guest.getByLabel('E-mail').fill(email);
	await guest.getByLabel('Password').fill('a-long-new-password');
	await guest.getByRole('button', { name: 'Sign in' }).click();
	await expect(guest.getByRole('alert')).toBeVisible();
	await expect(guest.getByTestId('who')).toHaveCount(0);
	await guest.close();

	// An admin cannot withdraw their own access, and nonsense is refused with a message.
	const own = await page.request.get('/api/me');
	const me = (await own.json()) as { id: number };
	for (const [userId, message] of [
		[String(me.id), 'You cannot withdraw your own access.'],
		['not-a-number', 'Choose a person.'],
		['99999999', 'There is no such person.']
	]) {
		const res = await page.request.post('/admin/people?/withdraw', {
			form: { userId },
			headers: { origin: new URL(page.url()).origin, 'x-sveltekit-action': 'true' }
		});
		const body = await res.json();
		expect([400, 404], userId).toContain(body.status);
		expect(JSON.stringify(body.data), userId).toContain(message);
	}
	await page.goto('/admin/people');
	await hydrated(page);
	await expect(page.getByTestId('who')).toBeVisible();
});

test('a member who forgot their password sets a new one by e-mail, and their other sessions end', async ({
	page,
	browser
}) => {
	const email = `forgetful-${Date.now()}@floorset.test`;
	await signIn(page, 'admin');
	// Signed in on one device (`elsewhere`), they ask for a link on another.
	const { guest: elsewhere } = await inviteAndJoin(page, browser, 'Pip Forgetful', email);
	const other = await browser.newPage();
	await other.goto('/signin');
	await hydrated(other);
	await other.getByRole('link', { name: 'Forgot your password?' }).click();
	// The sign-in page has an E-mail field too: wait for the new page, live, before filling one in.
	await expect(other).toHaveURL(/\/signin\/forgot$/);
	await expect(other.getByRole('button', { name: 'Send the link' })).toBeVisible();
	await hydrated(other);
	await other.getByLabel('E-mail').fill(email);
	await other.getByRole('button', { name: 'Send the link' }).click();
	await expect(other.getByRole('status')).toContainText(`If ${email} belongs to someone`);

	// An unknown address gets the very same answer.
	await other.goto('/signin/forgot');
	await hydrated(other);
	await other.getByLabel('E-mail').fill(`nobody-${Date.now()}@floorset.test`);
	await other.getByRole('button', { name: 'Send the link' }).click();
	await expect(other.getByRole('status')).toContainText('belongs to someone on the team');

	// The mail is sent in the background: look until it is in the outbox.
	let link: string | undefined;
	await expect
		.poll(async () => {
			await page.goto('/admin/outbox');
			await hydrated(page);
			const message = page
				.getByTestId('outbox-message')
				.filter({ hasText: email })
				.filter({ hasText: 'Set a new Floorset password' });
			if ((await message.count()) === 0) return undefined;
			await message.first().locator('summary').click();
			link = (await message.first().locator('pre').innerText()).match(
				/https?:\/\/\S+\/reset\/\S+/
			)?.[0];
			return link;
		})
		.toBeTruthy();

	await other.goto(link!);
	await hydrated(other);
	await other.getByLabel('New password').fill('a-second-long-password');
	await other.getByLabel('The same again').fill('a-second-long-passwort');
	await other.getByRole('button', { name: 'Set password' }).click();
	await expect(other.getByRole('alert')).toHaveText('The two passwords differ.');
	await other.getByLabel('New password').fill('a-second-long-password');
	await other.getByLabel('The same again').fill('a-second-long-password');
	await other.getByRole('button', { name: 'Set password' }).click();
	await expect(other).toHaveURL(/\/signin\?reset=1/);
	await expect(other.getByRole('status')).toHaveText('Your new password is set. Sign in with it.');
	await hydrated(other);
	await other.getByLabel('E-mail').fill(email);
	await other.getByLabel('Password').fill('a-second-long-password');
	await other.getByRole('button', { name: 'Sign in' }).click();
	await expect(other.getByTestId('who')).toContainText('Pip Forgetful · Dancer');

	// The session from before the reset is over; the link does not work twice.
	await elsewhere.goto('/evenings');
	await hydrated(elsewhere);
	await expect(elsewhere).toHaveURL(/\/signin/);
	expect((await other.goto(link!))?.status()).toBe(404);

	// One address cannot ask without end, whatever addresses it names (two asks made above).
	const statuses: number[] = [];
	for (let i = 0; i < 9; i++) {
		const res = await other.request.post('/signin/forgot', {
			form: { email: `asker-${i}-${Date.now()}@floorset.test` },
			headers: { origin: new URL(other.url()).origin, 'x-sveltekit-action': 'true' }
		});
		statuses.push(((await res.json()) as { status: number }).status);
	}
	expect(statuses).toEqual([...Array(8).fill(200), 429]);
	await elsewhere.close();
	await other.close();
});

test('an admin sees invitations not yet used, sends one again and cancels it', async ({ page }) => {
	const email = `pending-${Date.now()}@floorset.test`;
	await signIn(page, 'admin');
	await page.goto('/admin/people');
	await hydrated(page);
	await page.getByLabel('Name').fill('Ottoline Pending');
	await page.getByLabel('E-mail').fill(email);
	await page.getByRole('button', { name: 'Send invitation' }).click();
	await expect(page.getByRole('status')).toContainText(`Invitation sent to ${email}`);
	const row = page.getByTestId('pending').filter({ hasText: email });
	await expect(row).toContainText('The link works until');
	await row.getByRole('button', { name: 'Send again' }).click();
	await expect(page.getByRole('status')).toContainText(`Sent again to ${email}`);
	await row.getByRole('button', { name: 'Cancel the invitation' }).click();
	await expect(page.getByTestId('pending').filter({ hasText: email })).toHaveCount(0);
	// Two messages went out, and the newer link no longer opens.
	await page.goto('/admin/outbox');
	await hydrated(page);
	const sent = page.getByTestId('outbox-message').filter({ hasText: email });
	await expect(sent).toHaveCount(2);
	await sent.first().locator('summary').click();
	const link = /https?:\/\/\S+\/invite\/\S+/.exec(
		await sent.first().locator('pre').innerText()
	)![0];
	const answer = await page.request.get(link);
	expect(await answer.text()).toMatch(/no longer valid|not valid|expired/i);
});

test('the safe floors page is open to everyone and cites the WHO standard', async ({ page }) => {
	await page.goto('/');
	await hydrated(page);
	await page.getByRole('link', { name: 'Safe floors' }).click();
	await expect(page.getByRole('heading', { name: 'Safe floors' })).toBeVisible();
	// WHO, Global standard for safe listening venues and events (2022): 100 dB LAeq over 15 min.
	await expect(page.getByText('100 dB LAeq over any 15 minutes')).toBeVisible();
});

test('health check answers with the database state', async ({ request }) => {
	const res = await request.get('/healthz');
	expect(res.status()).toBe(200);
	const body = await res.json();
	expect(body).toMatchObject({ ok: true, db: 'ok' });
	expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
});
