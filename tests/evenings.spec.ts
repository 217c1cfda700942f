// Evenings end to end in Chromium: the organiser plans the demo evening, drags an entry, locks
// it, re-plans (the lock holds) and saves; two editors at once get a 409 instead of a lost save;
// a dancer sees only published evenings and cannot edit; the DJ's desk shows the current entry
// and the sound-level caution.
import {
	expect,
	request as newRequest,
	test,
	type APIRequestContext,
	type Page
} from '@playwright/test';
import { BASE, signIn, signInApi, hydrated } from './helpers';

test.describe.configure({ mode: 'serial' });

const headers = { origin: BASE, accept: 'application/json' };

async function entryNames(page: Page) {
	return page.getByTestId('entry-name').allTextContents();
}

/** The same, signed in as the organiser through a context of its own. */
async function ensureDemoRunOrder() {
	const api = await newRequest.newContext({ baseURL: BASE });
	await signInApi(api, 'organiser');
	await ensureRunOrder(api);
	await api.dispose();
}

/** Plans evening 1 and saves it through the API when it has no run order yet. */
async function ensureRunOrder(api: APIRequestContext) {
	const current = await (await api.get('/api/evenings/1/run-order')).json();
	if (current.entries.length > 0) return;
	const planned = await api.post('/api/evenings/1/plan', { data: { seed: 2 }, headers });
	expect(planned.status()).toBe(200);
	const { entries } = await planned.json();
	const saved = await api.put('/api/evenings/1/run-order', {
		data: { version: current.runOrderVersion, entries },
		headers
	});
	expect(saved.status(), await saved.text()).toBe(200);
}

test('the organiser plans the demo evening, drags and locks an entry, re-plans and saves', async ({
	page
}) => {
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	await expect(page.getByRole('heading', { name: 'Lantern Night Social' })).toBeVisible();
	await page.getByRole('button', { name: /Plan the evening|Re-plan around the locks/ }).click();
	await expect(page.getByTestId('proposal')).toBeVisible();
	await expect(page.getByText('Wishes it could not meet')).toBeVisible();
	const planned = await entryNames(page);
	expect(planned.length).toBeGreaterThan(10);
	// The chart's words and its table alternative follow the proposal.
	await expect(page.getByTestId('chart-summary')).toContainText('dances.');
	await page.getByRole('button', { name: 'Keep this plan' }).click();
	await expect(page.getByTestId('run-order-notice')).toContainText('Saved');

	// Drag an entry (one whose name is unique) two places down with the mouse, by its handle.
	const k = planned.findIndex((n, i) => i >= 4 && planned.indexOf(n) === planned.lastIndexOf(n));
	const rows = page.getByTestId('entry');
	const moving = planned[k];
	const handle = rows.nth(k).getByLabel(/^Drag /);
	const target = rows.nth(k + 2);
	// Both rows in the middle of the viewport: the mouse only reaches what is on screen, and
	// near an edge the library scrolls the page under a held drag (compact rows sit close).
	await rows.nth(k + 1).evaluate((el) => el.scrollIntoView({ block: 'center' }));
	const from = (await handle.boundingBox())!;
	const to = (await target.boundingBox())!;
	await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
	await page.mouse.down();
	await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2 + 10, { steps: 5 });
	// The library checks where the dragged copy is a few times a second: move, then hold still.
	for (let f = 1; f <= 5; f++) {
		const y =
			from.y + from.height / 2 + ((to.y + to.height * 0.8 - from.y - from.height / 2) * f) / 5;
		await page.mouse.move(from.x + from.width / 2, y, { steps: 5 });
		await page.waitForTimeout(250);
	}
	await page.mouse.up();
	// The drop settles after a short animation; read the order only once the dragged copy is gone.
	await expect(page.locator('#dnd-action-dragged-el')).toHaveCount(0);
	// A failed drag fails the test: the Up/Down buttons are tested on their own below.
	const at = (await entryNames(page)).indexOf(moving);
	// A drag lands where the pointer let go (two or three places down).
	expect(at, 'the mouse drag moved the entry down').toBeGreaterThan(k);
	expect(at).toBeLessThanOrEqual(k + 3);
	await expect(page.getByText('Unsaved changes')).toBeVisible();

	// Lock it, then re-plan: the locked entry stays where it is, with the same dance and track.
	const row = rows.nth(at);
	const track = await row.locator('p').nth(1).textContent();
	const time = await row.getByTestId('entry-time').textContent();
	await row.getByRole('button', { name: /^Lock/ }).click();
	await expect(row).toHaveAttribute('data-locked', 'true');
	await page.getByRole('button', { name: 'Try another arrangement' }).click();
	await expect(page.getByTestId('proposal')).toBeVisible();
	const locked = page.locator('[data-testid="entry"][data-locked="true"]');
	await expect(locked).toHaveCount(1);
	await expect(locked.getByTestId('entry-name')).toHaveText(moving);
	await expect(locked.locator('p').nth(1)).toHaveText(track!);
	// The planner keeps a lock at its start time (entries before it may change in number).
	await expect(locked.getByTestId('entry-time')).toHaveText(time!);
	// The reasons open under the row.
	await locked.getByRole('button', { name: /^More for/ }).click();
	await expect(locked).toContainText('locked by the team');

	await page.getByRole('button', { name: 'Keep this plan' }).click();
	await expect(page.getByTestId('run-order-notice')).toContainText('Saved');
	await page.reload();
	const kept = page.locator('[data-testid="entry"][data-locked="true"]');
	await expect(kept.getByTestId('entry-name')).toHaveText(moving);
	await expect(kept.getByTestId('entry-time')).toHaveText(time!);
});

test('two editors at once: the stale save gets 409 and both versions to choose from', async ({
	page
}) => {
	const other = await newRequest.newContext({ baseURL: BASE });
	await signInApi(other, 'organiser');
	await ensureRunOrder(other);
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	const first = await entryNames(page);
	// Someone else saves first (one entry fewer) while this page is open.
	const current = await (await other.get('/api/evenings/1/run-order')).json();
	const theirs = await other.put('/api/evenings/1/run-order', {
		data: { version: current.runOrderVersion, entries: current.entries.slice(0, -1) },
		headers
	});
	expect(theirs.status()).toBe(200);
	// This page still holds the old version: its save is refused, not written over theirs.
	await page.getByTestId('entry').first().getByRole('button', { name: /^Down/ }).click();
	await page.getByRole('button', { name: 'Save the run order' }).click();
	const notice = page.getByTestId('run-order-notice');
	await expect(notice).toContainText('Someone else saved this run order');
	expect((await other.get('/api/evenings/1/run-order').then((r) => r.json())).entries).toHaveLength(
		first.length - 1
	);
	// Both versions side by side, the lines that differ marked.
	await expect(notice.getByTestId('conflict-mine').locator('li')).toHaveCount(first.length);
	await expect(notice.getByTestId('conflict-theirs').locator('li')).toHaveCount(first.length - 1);
	await expect(notice.locator('li[data-differs="true"]').first()).toBeVisible();
	await notice.getByRole('button', { name: 'Take the saved version' }).click();
	await expect(page.getByTestId('entry')).toHaveCount(first.length - 1);

	// Once more, and this time keep mine: it is saved over the other, knowingly.
	const again = await (await other.get('/api/evenings/1/run-order')).json();
	expect(
		(
			await other.put('/api/evenings/1/run-order', {
				data: { version: again.runOrderVersion, entries: again.entries.slice(0, -1) },
				headers
			})
		).status()
	).toBe(200);
	await page.getByTestId('entry').first().getByRole('button', { name: /^Down/ }).click();
	const mine = await entryNames(page);
	await page.getByRole('button', { name: 'Save the run order' }).click();
	await notice.getByRole('button', { name: 'Keep mine and save it' }).click();
	await expect(notice).toContainText('Saved.');
	const kept = (await other.get('/api/evenings/1/run-order').then((r) => r.json())).entries;
	// Theirs had one entry fewer than mine: the saved length says whose version won.
	expect(kept).toHaveLength(mine.length);
	// The stale call as the API sees it.
	const stale = await other.put('/api/evenings/1/run-order', {
		data: { version: current.runOrderVersion, entries: [] },
		headers
	});
	expect(stale.status()).toBe(409);
	expect((await stale.json()).error).toMatch(/Reload/);
	await other.dispose();
});

test('a dancer sees only published evenings and cannot change them', async ({ page }) => {
	const dancer = await newRequest.newContext({ baseURL: BASE });
	await signInApi(dancer, 'dancer');
	const list = await (await dancer.get('/api/evenings')).json();
	expect(list.items.length).toBeGreaterThan(0);
	expect(list.items.every((e: { published: boolean }) => e.published)).toBe(true);
	expect((await dancer.get('/api/evenings/2')).status()).toBe(404);
	expect((await dancer.get('/api/evenings/1')).status()).toBe(200);
	const patch = await dancer.patch('/api/evenings/1', { data: { title: 'Mine now' }, headers });
	expect(patch.status()).toBe(403);
	const put = await dancer.put('/api/evenings/1/run-order', {
		data: { version: 1, entries: [] },
		headers
	});
	expect(put.status()).toBe(403);
	const plan = await dancer.post('/api/evenings/1/plan', { data: {}, headers });
	expect(plan.status()).toBe(403);
	await dancer.dispose();

	await signIn(page, 'dancer');
	await page.goto('/evenings');
	await hydrated(page);
	await expect(page.getByRole('link', { name: 'Lantern Night Social' })).toBeVisible();
	await expect(page.getByText('New Year Beginners’ Evening')).toHaveCount(0);
	await expect(page.getByRole('link', { name: 'New evening' })).toHaveCount(0);
	await page.goto('/evenings/1');
	await hydrated(page);
	await expect(page.getByRole('heading', { name: 'Lantern Night Social' })).toBeVisible();
	await expect(page.getByRole('button', { name: /Plan the evening|Re-plan/ })).toHaveCount(0);
	await expect(page.getByRole('link', { name: 'Edit the evening' })).toHaveCount(0);
	expect((await page.goto('/evenings/2'))?.status()).toBe(404);
});

test('the desk view shows the current entry, the section time left and the sound caution', async ({
	page
}) => {
	await ensureDemoRunOrder();
	// 19:20 on the demo evening (in December London is on UTC): twenty minutes into the lesson.
	await page.clock.setFixedTime(new Date('2026-12-11T19:20:00Z'));
	await signIn(page, 'dj');
	await page.goto('/evenings/1/desk');
	await hydrated(page);
	const now = page.getByTestId('desk-current');
	await expect(now).toBeVisible();
	await expect(now).not.toContainText('Nothing playing yet');
	await expect(page.getByRole('timer', { name: 'Time now' })).toHaveText('19:20:00');
	// The lesson runs 19:00–19:40: 20 minutes left (plain arithmetic).
	await expect(page.getByTestId('section-left')).toContainText('20:00 left in the section');
	const caution = page.getByLabel('Sound level caution');
	await expect(caution).toContainText('100 dB LAeq over any 15 minutes');
	// The next rest: the first break the saved run order starts after 19:20 (1,200 s in), in
	// whole minutes rounded up.
	const order = await (await page.request.get('/api/evenings/1/run-order')).json();
	const rest = (order.entries as { kind: string; startS: number }[]).find(
		(e) => e.kind === 'break' && e.startS > 1200
	);
	if (rest) {
		const minutes = Math.ceil((rest.startS - 1200) / 60);
		await expect(page.getByTestId('desk-rest')).toHaveText(`In ${minutes} minutes`);
	} else await expect(page.getByTestId('desk-rest')).toHaveText('No rest planned after this.');
	// Next moves by hand; "Follow the clock" returns to the planned position.
	const before = await now.textContent();
	await page.getByRole('button', { name: 'Next' }).click();
	await expect(page.getByText('Moved by hand.')).toBeVisible();
	await expect(now).not.toHaveText(before!);
	await page.getByRole('button', { name: 'Follow the clock' }).click();
	await expect(now).toHaveText(before!);
});

test('the evenings API: create, read, change and delete, with clear refusals', async () => {
	const api = await newRequest.newContext({ baseURL: BASE });
	await signInApi(api, 'organiser');
	const body = {
		title: 'Hollyhock Hop',
		startsAt: '2027-02-05T19:00:00Z',
		endsAt: '2027-02-05T22:00:00Z',
		crowd: 'experienced',
		sections: [
			{ kind: 'open-floor', startsAt: '2027-02-05T19:00:00Z', endsAt: '2027-02-05T21:50:00Z' },
			{ kind: 'last-dance', startsAt: '2027-02-05T21:50:00Z', endsAt: '2027-02-05T22:00:00Z' }
		]
	};
	const post = (data: unknown) => api.post('/api/evenings', { data, headers });
	const badDate = await post({ ...body, startsAt: '5 February' });
	expect(badDate.status()).toBe(422);
	expect((await badDate.json()).error).toMatch(/startsAt/);
	const outside = structuredClone(body);
	outside.sections[1].endsAt = '2027-02-05T22:30:00Z';
	expect((await post(outside)).status()).toBe(422);
	const overlap = structuredClone(body);
	overlap.sections[1].startsAt = '2027-02-05T21:00:00Z';
	const refused = await post(overlap);
	expect(refused.status()).toBe(422);
	expect((await refused.json()).error).toMatch(/overlaps/);
	const notJson = await api.post('/api/evenings', {
		data: 'title=x',
		headers: { ...headers, 'content-type': 'text/plain' }
	});
	expect(notJson.status()).toBe(415);

	const created = await post(body);
	expect(created.status()).toBe(201);
	const evening = await created.json();
	expect(evening).toMatchObject({
		title: 'Hollyhock Hop',
		startsAt: '2027-02-05T19:00:00.000Z',
		endsAt: '2027-02-05T22:00:00.000Z',
		status: 'draft',
		runOrderVersion: 1,
		entries: []
	});
	expect(evening.sections).toHaveLength(2);
	const list = await (await api.get('/api/evenings')).json();
	expect(list.items.some((e: { id: number }) => e.id === evening.id)).toBe(true);
	const patched = await api.patch(`/api/evenings/${evening.id}`, {
		data: { title: 'Hollyhock Hop II', version: evening.version },
		headers
	});
	expect(patched.status()).toBe(200);
	expect((await patched.json()).title).toBe('Hollyhock Hop II');
	const stale = await api.patch(`/api/evenings/${evening.id}`, {
		data: { title: 'Lost edit', version: evening.version },
		headers
	});
	expect(stale.status()).toBe(409);
	// Issue 13, finding 3: a body-less POST from another site, with the organiser's cookie,
	// must not publish the draft (SvelteKit's own check covers form content types only).
	const crossSite = await api.post(`/api/evenings/${evening.id}/publish`, {
		headers: { origin: 'http://evil.example', accept: 'application/json' }
	});
	expect(crossSite.status()).toBe(403);
	expect((await crossSite.json()).error).toMatch(/Cross-site/);
	expect((await (await api.get(`/api/evenings/${evening.id}`)).json()).status).toBe('draft');
	expect((await api.delete(`/api/evenings/${evening.id}`, { headers })).status()).toBe(204);
	expect((await api.get(`/api/evenings/${evening.id}`)).status()).toBe(404);
	await api.dispose();
});

test('the organiser creates, edits and deletes an evening through the forms', async ({ page }) => {
	await signIn(page, 'organiser');
	await page.goto('/evenings');
	await hydrated(page);
	await page.getByRole('link', { name: 'New evening' }).click();
	await page.getByLabel('Title', { exact: true }).fill('Thistledown Social');
	await page.getByLabel('Date').fill('2027-03-12');
	await page.getByRole('button', { name: 'Create the evening' }).click();
	await expect(page.getByRole('heading', { name: 'Thistledown Social' })).toBeVisible();
	await expect(page.getByText(/Friday,? 12 March 2027, 19:30–23:00/)).toBeVisible();
	// The outline's six sections came along.
	await expect(page.locator('#sections-h + ol > li')).toHaveCount(6);

	await page.getByRole('link', { name: 'Edit the evening' }).click();
	// Section 2 made to start inside the lesson: refused, with the typed values kept.
	await page.getByLabel('Section 2: from').fill('20:00');
	await page.getByRole('button', { name: 'Save the evening' }).click();
	await expect(page.getByRole('alert')).toContainText('overlaps');
	await expect(page.getByLabel('Section 2: from')).toHaveValue('20:00');
	await page.getByLabel('Section 2: from').fill('20:10');
	await page.getByLabel('Notes').fill('Bring a friend.');
	await page.getByRole('button', { name: 'Save the evening' }).click();
	await expect(page.getByText('Bring a friend.')).toBeVisible();

	await page.getByRole('link', { name: 'Edit the evening' }).click();
	await page.getByRole('button', { name: 'Delete…' }).click();
	await page.getByRole('button', { name: 'Yes, delete it' }).click();
	await expect(page).toHaveURL(/\/evenings$/);
	await expect(page.getByText('Thistledown Social')).toHaveCount(0);
});

test('swap a track for another that fits the same dance, insert and remove entries', async ({
	page
}) => {
	await ensureDemoRunOrder();
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	const rows = page.getByTestId('entry');
	const count = await rows.count();
	const dance = page.locator('[data-testid="entry"][data-kind="dance"]').nth(2);
	const detail = dance.getByTestId('entry-detail');
	const before = await detail.textContent();
	// The rarer actions open under the row.
	await dance.getByRole('button', { name: /^More for/ }).click();
	await dance.getByRole('button', { name: /^Swap track/ }).click();
	const offers = page.getByRole('button', { name: /^Use / });
	await expect(offers.first()).toBeVisible();
	// Songs already in tonight's order come last, each marked with the entry that plays it.
	const anyway = page.getByRole('button', { name: /^Use anyway / });
	await expect(page.getByText(/^already in this night’s order \(entry \d+\)$/)).toHaveCount(
		await anyway.count()
	);
	const plain = await page.getByRole('button', { name: /^Use (?!anyway )/ }).count();
	if (plain > 0) await expect(offers.first()).not.toHaveText(/^Use anyway /);
	const choice = (await offers.first().textContent())!.replace(/^Use (anyway )?/, '');
	await offers.first().click();
	await expect(detail).not.toHaveText(before!);
	await expect(detail).toContainText(choice);
	await expect(dance).toContainText('track chosen by hand from the fit ranking');

	// An announcement added at the end, then a removal: the count follows.
	await page.getByLabel('Kind').selectOption('announcement');
	await page.getByLabel('What to say').fill('Raffle at the break');
	await page.getByRole('button', { name: 'Add', exact: true }).click();
	await expect(rows).toHaveCount(count + 1);
	await expect(rows.last()).toContainText('Announcement: Raffle at the break');
	await rows
		.first()
		.getByRole('button', { name: /^More for/ })
		.click();
	await rows
		.first()
		.getByRole('button', { name: /^Remove/ })
		.click();
	await expect(rows).toHaveCount(count);
	await page.getByRole('button', { name: 'Save the run order' }).click();
	await expect(page.getByTestId('run-order-notice')).toContainText('Saved');
	await page.reload();
	await expect(rows.last()).toContainText('Announcement: Raffle at the break');
	await expect(page.getByText(choice).first()).toBeVisible();
});

/** The demo evening's run order, open for the organiser, and an entry whose dance is there once. */
async function openRunOrderAtAUniqueEntry(page: Page) {
	await ensureDemoRunOrder();
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	const names = await entryNames(page);
	const k = names.findIndex((n, i) => i >= 4 && names.indexOf(n) === names.lastIndexOf(n));
	return { names, k };
}

test('the Down and Up buttons each move an entry exactly one place', async ({ page }) => {
	const { names, k } = await openRunOrderAtAUniqueEntry(page);
	const rows = page.getByTestId('entry');
	await rows.nth(k).getByRole('button', { name: /^Down/ }).click();
	// Down swaps it with the next entry and changes nothing else.
	const down = [...names];
	[down[k], down[k + 1]] = [down[k + 1], down[k]];
	await expect.poll(() => entryNames(page)).toEqual(down);
	await expect(page.getByText('Unsaved changes')).toBeVisible();
	await rows
		.nth(k + 1)
		.getByRole('button', { name: /^Up/ })
		.click();
	await expect.poll(() => entryNames(page)).toEqual(names);
});

test('the run order can be reordered from the keyboard alone', async ({ page }) => {
	const { names, k } = await openRunOrderAtAUniqueEntry(page);
	// The drag handle takes Space to pick up, arrows to move and Space to put down.
	const handle = page
		.getByTestId('entry')
		.nth(k)
		.getByLabel(/^Drag /);
	await handle.focus();
	await page.keyboard.press('Space');
	await page.keyboard.press('ArrowDown');
	await page.keyboard.press('Space');
	await expect.poll(async () => (await entryNames(page)).indexOf(names[k])).toBe(k + 1);
	// The explicit buttons do the same: Up puts it back.
	await page
		.getByTestId('entry')
		.nth(k + 1)
		.getByRole('button', { name: /^Up/ })
		.click();
	await expect.poll(() => entryNames(page)).toEqual(names);
});

/** Opens the run order and moves one entry down with its button; the order before and after. */
async function moveOneEntryDown(page: Page) {
	const { names, k } = await openRunOrderAtAUniqueEntry(page);
	await page.getByTestId('entry').nth(k).getByRole('button', { name: /^Down/ }).click();
	const moved = [...names];
	[moved[k], moved[k + 1]] = [moved[k + 1], moved[k]];
	await expect.poll(() => entryNames(page)).toEqual(moved);
	return { names, moved };
}

test('leaving with unsaved changes asks first; staying keeps the edit', async ({ page }) => {
	const { moved } = await moveOneEntryDown(page);
	// "Stay": the page and the unsaved order are still there.
	const asked: string[] = [];
	page.once('dialog', (d) => (asked.push(d.message()), d.dismiss()));
	await page.getByRole('link', { name: 'All evenings' }).click();
	await expect
		.poll(() => asked)
		.toEqual(['The run order has unsaved changes. Leave without saving them?']);
	await expect(page).toHaveURL(/\/evenings\/\d+$/);
	expect(await entryNames(page)).toEqual(moved);
	await expect(page.getByText('Unsaved changes')).toBeVisible();
	// "Leave": the navigation goes ahead.
	page.once('dialog', (d) => d.accept());
	await page.getByRole('link', { name: 'All evenings' }).click();
	await expect(page).toHaveURL(/\/evenings$/);
});

test('undo and redo, by button and by keyboard, walk the edits back and forth', async ({
	page
}) => {
	const { names, moved } = await moveOneEntryDown(page);
	await page.getByRole('button', { name: 'Undo', exact: true }).click();
	await expect.poll(() => entryNames(page)).toEqual(names);
	// Back to the saved order: nothing is left unsaved.
	await expect(page.getByText('Unsaved changes')).toHaveCount(0);
	await page.getByRole('button', { name: 'Redo', exact: true }).click();
	await expect.poll(() => entryNames(page)).toEqual(moved);
	await page.locator('body').press('Control+z');
	await expect.poll(() => entryNames(page)).toEqual(names);
	await page.locator('body').press('Control+Shift+z');
	await expect.poll(() => entryNames(page)).toEqual(moved);
	await expect(page.getByText('Unsaved changes')).toBeVisible();
});

test('the tempo and level charts share one time axis; on a phone the time labels stay apart', async ({
	page
}) => {
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	const chart = page.getByRole('figure', { name: 'Tempo and difficulty through the night' });
	const firstTickX = async (i: number) =>
		(await chart
			.locator('svg')
			.nth(i)
			.locator('[aria-label="x-axis tick"] path')
			.first()
			.boundingBox())!.x;
	await expect(chart.locator('svg')).toHaveCount(2);
	// The same moment of the night at the same x in both charts (issue 12, "The chart").
	expect(Math.abs((await firstTickX(0)) - (await firstTickX(1)))).toBeLessThan(1);
	await page.setViewportSize({ width: 390, height: 800 });
	const labels = chart.locator('svg').first().locator('[aria-label="x-axis tick label"] text');
	await expect.poll(() => labels.count()).toBeLessThanOrEqual(3);
	const boxes = await Promise.all((await labels.all()).map((l) => l.boundingBox()));
	const spans = boxes.map((b) => [b!.x, b!.x + b!.width]).sort((a, b) => a[0] - b[0]);
	for (let i = 1; i < spans.length; i++) expect(spans[i][0]).toBeGreaterThan(spans[i - 1][1]);
});

// Issue 15, "Compact and phone-sized": a 50-entry night under 4,000 px at 1366 × 800, each entry
// at most 120 px tall at 390 × 844. Measured from the rendered page, on the demo night.
test('the run order stays compact: under 4,000 px for 50 entries, each entry low on a phone', async ({
	page
}) => {
	await ensureDemoRunOrder();
	await page.setViewportSize({ width: 1366, height: 800 });
	await signIn(page, 'organiser');
	await page.goto('/evenings/1');
	await hydrated(page);
	const rows = page.getByTestId('entry');
	const count = await rows.count();
	expect(count).toBeGreaterThanOrEqual(40);
	const pageHeight = () => page.evaluate(() => document.documentElement.scrollHeight);
	// Scaled to 50 entries when the demo night has another number.
	const listBox = (await page.getByRole('list', { name: 'Run order' }).boundingBox())!;
	const scaled = (await pageHeight()) - listBox.height + (listBox.height / count) * 50;
	expect(scaled).toBeLessThan(4000);

	await page.setViewportSize({ width: 390, height: 844 });
	const heights = await rows.evaluateAll((els) => els.map((e) => e.getBoundingClientRect().height));
	expect(Math.max(...heights)).toBeLessThanOrEqual(120);
	// Nothing sideways: the page is no wider than the phone.
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
	// The actions are a tap away: open, then move the entry down.
	const first = await page.getByTestId('entry-name').first().textContent();
	await rows
		.first()
		.getByRole('button', { name: /^More for/ })
		.click();
	await rows.first().getByRole('button', { name: /^Down/ }).click();
	await expect(page.getByTestId('entry-name').nth(1)).toHaveText(first!);
	console.log(
		`run order: ${count} entries, page ${Math.round(scaled)} px for 50 at 1366; tallest entry ${Math.max(...heights)} px at 390`
	);
});
