// On a slow phone (a venue's weak signal) people type into a form before its scripts have
// loaded. What they typed must still be there when the page goes live, and the form must still
// send. The page's scripts are held back here until the fields are filled in.
import { expect, test, type Page } from '@playwright/test';
import { BASE, DEMO_PASSWORD, emailOf, hydrated, signIn, signInApi } from './helpers';

/** Holds every script of the app until `release()` is called. */
async function holdScripts(page: Page) {
	let release!: () => void;
	const released = new Promise<void>((resolve) => (release = resolve));
	await page.route(/\/_app\/immutable\/.+\.js$/, async (route) => {
		await released;
		await route.continue();
	});
	return release;
}

test('typed into the sign-in form before the page is live: kept, and it signs in', async ({
	page
}) => {
	const release = await holdScripts(page);
	await page.goto('/signin', { waitUntil: 'domcontentloaded' });
	await page.getByLabel('E-mail').fill(emailOf('dancer'));
	await page.getByLabel('Password').fill(DEMO_PASSWORD);
	await expect(page.locator('html[data-hydrated]')).toHaveCount(0);
	release();
	await hydrated(page);
	await expect(page.getByLabel('E-mail')).toHaveValue(emailOf('dancer'));
	await expect(page.getByLabel('Password')).toHaveValue(DEMO_PASSWORD);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
});

test('typed into the forgot-password form before the page is live: kept', async ({ page }) => {
	const release = await holdScripts(page);
	await page.goto('/signin/forgot', { waitUntil: 'domcontentloaded' });
	await page.getByLabel('E-mail').fill('slow-phone@floorset.test');
	release();
	await hydrated(page);
	await expect(page.getByLabel('E-mail')).toHaveValue('slow-phone@floorset.test');
});

test('a dancer fills in a request on the public page before it is live: all of it is kept', async ({
	page,
	playwright
}) => {
	const organiser = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(organiser, 'organiser');
	// Evening 1 of the demo is published by the seed: read its link, change nothing.
	const { shareToken } = await (await organiser.get('/api/evenings/1')).json();
	await organiser.dispose();
	expect(shareToken).toBeTruthy();
	const shareUrl = `/e/${shareToken}`;

	const release = await holdScripts(page);
	await page.goto(shareUrl, { waitUntil: 'domcontentloaded' });
	const dance = page.getByLabel('Dance', { exact: true });
	const chosen = (await dance.locator('option').nth(2).getAttribute('value'))!;
	await dance.selectOption(chosen);
	await page.getByLabel('Or its name').fill('a slow one');
	await page.getByLabel('A note for the DJ (optional)').fill('Typed on a slow phone');
	await page.getByLabel('Your first name (optional)').fill('Wren');
	release();
	await hydrated(page);
	await expect(dance).toHaveValue(chosen);
	await expect(page.getByLabel('Or its name')).toHaveValue('a slow one');
	await expect(page.getByLabel('A note for the DJ (optional)')).toHaveValue(
		'Typed on a slow phone'
	);
	await expect(page.getByLabel('Your first name (optional)')).toHaveValue('Wren');
});

test('an organiser starts a new evening before the page is live: every field is kept', async ({
	page
}) => {
	await signIn(page, 'organiser');
	const release = await holdScripts(page);
	await page.goto('/evenings/new', { waitUntil: 'domcontentloaded' });
	await page.getByLabel('Title', { exact: true }).fill('Slow Signal Social');
	await page.getByLabel('Venue').fill('Upper room, Marram Hall');
	await page.getByLabel('Date').fill('2027-04-09');
	await page.getByLabel('Starts').fill('19:00');
	await page.getByLabel('Crowd').selectOption({ index: 2 });
	const crowd = await page.getByLabel('Crowd').inputValue();
	await page.getByLabel('Notes').fill('Typed on the bus');
	const sectionStart = await page.getByLabel('Section 2: from').inputValue();
	await page.getByLabel('Section 2: from').fill('20:05');
	release();
	await hydrated(page);
	await expect(page.getByLabel('Title', { exact: true })).toHaveValue('Slow Signal Social');
	await expect(page.getByLabel('Venue')).toHaveValue('Upper room, Marram Hall');
	await expect(page.getByLabel('Date')).toHaveValue('2027-04-09');
	await expect(page.getByLabel('Starts')).toHaveValue('19:00');
	await expect(page.getByLabel('Crowd')).toHaveValue(crowd);
	await expect(page.getByLabel('Notes')).toHaveValue('Typed on the bus');
	await expect(page.getByLabel('Section 2: from')).toHaveValue('20:05');

	// And the form still sends (section 2 back where the outline had it, so nothing overlaps).
	await page.getByLabel('Section 2: from').fill(sectionStart);
	await page.getByRole('button', { name: 'Create the evening' }).click();
	await expect(page.getByRole('heading', { name: 'Slow Signal Social' })).toBeVisible();
	const id = /\/evenings\/(\d+)$/.exec(page.url())?.[1];
	expect(id).toBeTruthy();
	const created = await (await page.request.get(`/api/evenings/${id}`)).json();
	expect(created).toMatchObject({ venue: 'Upper room, Marram Hall', notes: 'Typed on the bus' });
	const gone = await page.request.delete(`/api/evenings/${id}`, { headers: { origin: BASE } });
	expect(gone.status()).toBe(204);
});

test('the evening edit page shows the stored notes before it is live, and keeps what is typed', async ({
	page
}) => {
	await signIn(page, 'organiser');
	const release = await holdScripts(page);
	await page.goto('/evenings/1/edit', { waitUntil: 'domcontentloaded' });
	const notes = page.getByLabel('Notes');
	// Server-rendered: a form sent before the scripts run must not wipe the stored notes.
	await expect(notes).toHaveValue(/^Mince pies at the break\./);
	await notes.fill('Mince pies at the break, typed again on a slow phone.');
	release();
	await hydrated(page);
	await expect(notes).toHaveValue('Mince pies at the break, typed again on a slow phone.');
	// Nothing was saved; untouched, the stored notes are still there once the page is live.
	await page.unrouteAll();
	await page.goto('/evenings/1/edit');
	await hydrated(page);
	await expect(notes).toHaveValue(/^Mince pies at the break\./);
});

test('the DJ edits a track before the page is live: the typed facts are kept and saved', async ({
	page
}) => {
	await signIn(page, 'dj');
	// Demo track 5; only its album changes, and it is put back at the end.
	const { track: before } = await (await page.request.get('/api/tracks/5')).json();
	const release = await holdScripts(page);
	await page.goto('/music/5', { waitUntil: 'domcontentloaded' });
	await page.getByLabel('Album').fill('Typed before the page was live');
	await page.getByLabel('Meter').selectOption('3');
	// Saving needs the script: until it runs, the button cannot send the form the browser's way.
	await expect(page.getByRole('button', { name: 'Save the facts' })).toBeDisabled();
	release();
	await hydrated(page);
	await expect(page.getByLabel('Album')).toHaveValue('Typed before the page was live');
	await expect(page.getByLabel('Meter')).toHaveValue('3');
	await page.getByLabel('Meter').selectOption(String(before.meter));
	await page.getByRole('button', { name: 'Save the facts' }).click();
	await expect
		.poll(async () => (await (await page.request.get('/api/tracks/5')).json()).track.album)
		.toBe('Typed before the page was live');
	const { track: saved } = await (await page.request.get('/api/tracks/5')).json();
	expect(saved.meter).toBe(before.meter);
	const undo = await page.request.patch('/api/tracks/5', {
		data: { version: saved.version, album: before.album },
		headers: { origin: BASE }
	});
	expect(undo.status()).toBe(200);
});

test('the dance filter typed before the page is live is kept, sends, and Clear empties it', async ({
	page
}) => {
	await signIn(page, 'instructor');
	const release = await holdScripts(page);
	await page.goto('/dances', { waitUntil: 'domcontentloaded' });
	const search = page.getByRole('search');
	await search.getByLabel('Search').fill('Quillbrook');
	await search.getByLabel('Level').selectOption('beginner');
	release();
	await hydrated(page);
	await expect(search.getByLabel('Search')).toHaveValue('Quillbrook');
	await expect(search.getByLabel('Level')).toHaveValue('beginner');
	await search.getByRole('button', { name: 'Show' }).click();
	await expect(page).toHaveURL(/q=Quillbrook/);
	await expect(page).toHaveURL(/level=beginner/);
	await expect(page.getByRole('link', { name: 'Quillbrook Shuffle' })).toBeVisible();
	await search.getByRole('link', { name: 'Clear' }).click();
	await expect(page).toHaveURL(/\/dances$/);
	await expect(search.getByLabel('Search')).toHaveValue('');
	await expect(search.getByLabel('Level')).toHaveValue('');
});
