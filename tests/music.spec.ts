// The music library end to end, in Chromium, as the DJ: drop generated audio of known tempo and
// one text file renamed .mp3, watch the batch, check the measured tempi, flip one, tap one, and
// sort and filter the table (issue 3).
import { expect, test, type Page } from '@playwright/test';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encodeWav, generateSong } from '../src/lib/synth/index';
import { BASE, signIn, signInApi, hydrated } from './helpers';

// Three songs of known tempo (the check values are the generating tempi) and one impostor.
const SONGS = [
	{ name: 'e2e-reel-100.wav', bpm: 100, meter: 4 as const, seed: 11 },
	{ name: 'e2e-reel-128.wav', bpm: 128, meter: 4 as const, seed: 12 },
	{ name: 'e2e-reel-90-waltz.wav', bpm: 90, meter: 3 as const, seed: 13 }
];
// Accuracy 1 of Gouyon et al., "An experimental comparison of audio tempo induction
// algorithms", IEEE TASLP 14(5), 2006: an estimate within 4 % of the true tempo is correct.
const TOLERANCE = 0.04;

let dir: string;
test.beforeAll(() => {
	dir = mkdtempSync(join(tmpdir(), 'floorset-e2e-music-'));
	for (const s of SONGS) {
		const song = generateSong({
			bpm: s.bpm,
			meter: s.meter,
			durationS: 30,
			seed: s.seed,
			pad: true
		});
		writeFileSync(join(dir, s.name), encodeWav(song.samples, song.sampleRate));
	}
	writeFileSync(
		join(dir, 'e2e-lyrics.mp3'),
		'Verse one, the words only, no music here.\n'.repeat(30)
	);
});
test.afterAll(() => rmSync(dir, { recursive: true, force: true }));

test.describe.configure({ mode: 'serial' });

const grid = (page: Page) => page.getByTestId('tracks-grid');
const rowOf = (page: Page, title: string) =>
	grid(page)
		.getByTestId('track-row')
		.filter({ has: page.getByRole('link', { name: title, exact: true }) });
const bpmOf = async (page: Page, title: string) =>
	Number(await rowOf(page, title).getByTestId('bpm').textContent());

test('the demo’s 60 tracks load into the table', async ({ page }) => {
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await expect(page.getByTestId('library-count')).toHaveText('60 of 60 tracks shown');
	await expect(grid(page).getByTestId('track-row').first()).toBeVisible();
});

test('dropping three songs and a text file: progress, three tempi within 4 %, one clear error', async ({
	page
}) => {
	test.setTimeout(120_000);
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await expect(page.getByTestId('library-count')).toHaveText('60 of 60 tracks shown');
	await page
		.getByTestId('file-input')
		.setInputFiles([...SONGS.map((s) => join(dir, s.name)), join(dir, 'e2e-lyrics.mp3')]);

	// The batch bar and one row per file appear at once.
	await expect(page.getByTestId('batch-item')).toHaveCount(4);
	await expect(page.getByTestId('batch-progress')).toHaveAttribute('max', '4');
	await expect(page.getByText(/of 4 files done/)).toBeVisible();

	await expect(page.getByText('4 of 4 files done')).toBeVisible({ timeout: 90_000 });
	const impostor = page.getByTestId('batch-item').filter({ hasText: 'e2e-lyrics.mp3' });
	await expect(impostor).toHaveAttribute('data-state', 'failed');
	await expect(impostor.getByTestId('batch-message')).toContainText(/not (an )?audio/i);
	for (const s of SONGS) {
		await expect(page.getByTestId('batch-item').filter({ hasText: s.name })).toHaveAttribute(
			'data-state',
			'stored'
		);
	}

	// Three new rows, not four.
	await expect(page.getByTestId('library-count')).toHaveText('63 of 63 tracks shown');
	await page.getByLabel('Search title, artist, album').fill('e2e-');
	await expect(grid(page).getByTestId('track-row')).toHaveCount(3);
	for (const s of SONGS) {
		const title = s.name.replace(/\.wav$/, '');
		const bpm = await bpmOf(page, title);
		expect(Math.abs(bpm / s.bpm - 1), `${title}: measured ${bpm}`).toBeLessThanOrEqual(TOLERANCE);
	}
});

test('the server stored nothing for the impostor', async ({ playwright }) => {
	const request = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(request, 'dj');
	const res = await request.get('/api/tracks?q=e2e-&limit=10');
	const body = (await res.json()) as { total: number; items: { originalName: string }[] };
	expect(body.total).toBe(3);
	expect(body.items.map((i) => i.originalName)).not.toContain('e2e-lyrics.mp3');
	await request.dispose();
});

test('a tempo flips ×2 and back ÷2 in one click each', async ({ page }) => {
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await page.getByLabel('Search title, artist, album').fill('e2e-reel-100');
	const before = await bpmOf(page, 'e2e-reel-100');
	await rowOf(page, 'e2e-reel-100')
		.getByRole('button', { name: /Double the tempo/ })
		.click();
	await expect(rowOf(page, 'e2e-reel-100').getByTestId('bpm')).not.toHaveText(String(before));
	const doubled = await bpmOf(page, 'e2e-reel-100');
	expect(Math.abs(doubled / (before * 2) - 1)).toBeLessThanOrEqual(TOLERANCE);
	await rowOf(page, 'e2e-reel-100')
		.getByRole('button', { name: /Halve the tempo/ })
		.click();
	await expect(rowOf(page, 'e2e-reel-100').getByTestId('bpm')).not.toHaveText(String(doubled));
	expect(Math.abs((await bpmOf(page, 'e2e-reel-100')) / before - 1)).toBeLessThanOrEqual(TOLERANCE);
});

test('tapping a tempo on the track page saves it as tapped', async ({ page }) => {
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await page.getByLabel('Search title, artist, album').fill('e2e-reel-128');
	await rowOf(page, 'e2e-reel-128').getByRole('link', { name: 'e2e-reel-128' }).click();
	await expect(page.getByTestId('track-title')).toHaveText('e2e-reel-128');
	// The keyboard taps too (Space on the focused button) …
	const tapButton = page.getByRole('button', { name: 'Tap', exact: true });
	await tapButton.focus();
	await page.keyboard.press('Space');
	await expect(page.getByTestId('tap-readout')).toContainText('1 tap');
	// … and a pause of over 2 s starts the count again. Then eight taps exactly 500 ms apart,
	// timed inside the page so a busy machine cannot stretch the gaps: 60 000 ÷ 500 = 120 BPM.
	await page.waitForTimeout(2100);
	await tapButton.evaluate((button) => {
		const t0 = performance.now();
		for (let i = 0; i < 8; i++) {
			while (performance.now() < t0 + 500 * i) {
				/* wait in the page: the event's timeStamp is when it is made */
			}
			button.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true }));
		}
	});
	await expect(page.getByTestId('tap-readout')).toContainText('from 8 taps');
	const readout = await page.getByTestId('tap-readout').textContent();
	const tapped = Number(/([\d.]+) BPM/.exec(readout ?? '')?.[1]);
	expect(tapped).toBeCloseTo(120, 0);
	await page.getByRole('button', { name: /^Use / }).click();
	await expect(page.getByTestId('track-bpm')).toHaveText(String(tapped));
	await expect(page.getByTestId('track-bpm-source')).toHaveText('tapped');
	// Typed entry records its own source.
	await page.getByLabel('Type a tempo (BPM)').fill('127.5');
	await page.getByRole('button', { name: 'Save tempo' }).click();
	await expect(page.getByTestId('track-bpm')).toHaveText('127.5');
	await expect(page.getByTestId('track-bpm-source')).toHaveText('typed in');
	// The rate control shows the tempo heard at that rate: bpm × rate (DESIGN.md).
	await page.getByRole('button', { name: '0.9×' }).click();
	await expect(page.getByTestId('effective-bpm')).toContainText(
		`${Math.round(127.5 * 0.9 * 10) / 10} BPM (recorded at 127.5)`
	);
});

test('the table sorts, filters by tempo and meter, and moves by keyboard', async ({ page }) => {
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await expect(page.getByTestId('library-count')).toHaveText('63 of 63 tracks shown');
	const tempoHeader = grid(page).getByRole('columnheader', { name: 'Tempo', exact: true });
	await tempoHeader.getByRole('button').click();
	await expect(tempoHeader).toHaveAttribute('aria-sort', 'ascending');
	const firstTen = async () =>
		(await grid(page).getByTestId('bpm').allTextContents()).slice(0, 10).map(Number);
	const ascending = await firstTen();
	expect(ascending).toEqual([...ascending].sort((a, b) => a - b));
	await tempoHeader.getByRole('button').click();
	await expect(tempoHeader).toHaveAttribute('aria-sort', 'descending');
	const descending = await firstTen();
	expect(descending).toEqual([...descending].sort((a, b) => b - a));

	await page.getByLabel('Slowest (BPM)').fill('100');
	await page.getByLabel('Fastest (BPM)').fill('110');
	const bpms = async () => (await grid(page).getByTestId('bpm').allTextContents()).map(Number);
	await expect
		.poll(async () => {
			const shown = await bpms();
			return shown.length > 0 && shown.every((b) => b >= 100 && b <= 110);
		})
		.toBe(true);

	await page.getByLabel('Slowest (BPM)').fill('');
	await page.getByLabel('Fastest (BPM)').fill('');
	await page.getByRole('search').getByLabel('Meter').selectOption('3');
	await expect(page.getByTestId('library-count')).not.toHaveText(/^63 of 63/);
	const shown = await page.getByTestId('library-count').textContent();
	const waltzes = Number(/^(\d+) of/.exec(shown ?? '')?.[1]);
	expect(waltzes).toBeGreaterThan(0);
	expect(waltzes).toBeLessThan(63);

	// Keyboard: focus the grid, move down a row, Enter opens that track.
	await grid(page).focus();
	await page.keyboard.press('ArrowDown');
	const active = await grid(page).getAttribute('aria-activedescendant');
	expect(active).toMatch(/^track-row-\d+$/);
	await page.keyboard.press('Enter');
	await expect(page).toHaveURL(new RegExp(`/music/${active!.replace('track-row-', '')}$`));
});

test('bulk edit: select the shown rows, set an intro, mark them for a dance, filter by it', async ({
	page,
	playwright
}) => {
	await signIn(page, 'dj');
	await page.goto('/music');
	await hydrated(page);
	await expect(page.getByTestId('library-count')).toHaveText('63 of 63 tracks shown');
	await page.getByLabel('Search title, artist, album').fill('e2e-');
	await expect(grid(page).getByTestId('track-row')).toHaveCount(3);
	await page.getByLabel('Select all shown').check();
	await expect(page.getByRole('heading', { name: '3 selected' })).toBeVisible();

	await page.getByLabel('Intro (beats)').fill('8');
	await page.getByRole('button', { name: 'Apply to selected' }).click();
	await expect(page.getByText('Facts: 3 of 3 saved.')).toBeVisible();

	const dance = page.getByLabel('Mark selected for the dance');
	const danceName = (await dance.locator('option').nth(1).textContent())!.trim();
	await dance.selectOption({ label: danceName });
	await page.getByRole('button', { name: 'Mark selected' }).click();
	await expect(page.getByText('Verdicts: 3 of 3 saved.')).toBeVisible();

	// The server now holds both changes.
	const request = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(request, 'dj');
	const body = (await (await request.get('/api/tracks?q=e2e-')).json()) as {
		items: { introBeats: number }[];
	};
	expect(body.items.map((i) => i.introBeats)).toEqual([8, 8, 8]);

	// The dance filter shows the tracks the team marked for it: the three, and no others
	// with this search, each saying the word is the team's.
	await page.getByRole('search').getByLabel('Dance').selectOption({ label: danceName });
	await expect(grid(page).getByTestId('track-row')).toHaveCount(3);
	await expect(grid(page).getByTestId('fit-word')).toHaveText(Array(3).fill('team’s mark'));
	// Without the search it adds the tracks the engine finds suitable and nobody judged yet, as
	// many as the dance's fits list (the API) counts.
	const danceId = await page.getByRole('search').getByLabel('Dance').inputValue();
	const fits = (await (await request.get(`/api/dances/${danceId}/fits?limit=10000`)).json()) as {
		items: { fitting: boolean; verdict: string | null }[];
	};
	const computed = fits.items.filter((i) => i.fitting && !i.verdict).length;
	const team = fits.items.filter((i) => i.fitting && i.verdict).length;
	await page.getByLabel('Search title, artist, album').fill('');
	await expect(page.getByTestId('fit-words')).toHaveText(
		`${team} marked by the team · ${computed} computed from tempo and meter, not judged yet`
	);
	await expect(page.getByTestId('library-count')).toHaveText(
		`${team + computed} of 63 tracks shown`
	);
	await page.getByLabel('Search title, artist, album').fill('e2e-');
	await page.getByRole('search').getByLabel('Verdict').selectOption('does-not-fit');
	await expect(grid(page).getByTestId('track-row')).toHaveCount(0);
	await request.dispose();
});

test('over HTTP: an oversized upload is 413, a hostile name stays text, audio serves ranges', async ({
	playwright
}) => {
	const request = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(request, 'dj');
	const analysis = JSON.stringify({
		bpm: 120,
		offsetS: 0,
		confidence: 0.5,
		source: 'detected',
		meter: 4
	});
	// The e2e server runs with MAX_UPLOAD_MB=5 (scripts/e2e-server.ts).
	const big = await request.post('/api/tracks', {
		headers: { origin: BASE },
		multipart: {
			file: { name: 'big.wav', mimeType: 'audio/wav', buffer: Buffer.alloc(5.5 * 1024 * 1024, 1) },
			analysis
		}
	});
	expect(big.status()).toBe(413);
	expect((await big.json()).error).toMatch(/5 MB/);

	const song = generateSong({ bpm: 111, durationS: 6, seed: 21 });
	const hostile = await request.post('/api/tracks', {
		headers: { origin: BASE },
		multipart: {
			file: {
				name: '../../etc/\u202Epasswd\u0007.wav',
				mimeType: 'audio/wav',
				buffer: Buffer.from(encodeWav(song.samples, song.sampleRate))
			},
			analysis
		}
	});
	expect(hostile.status()).toBe(201);
	const { track } = (await hostile.json()) as { track: { id: number; originalName: string } };
	expect(track.originalName).toBe('passwd.wav');

	const part = await request.get(`/api/tracks/${track.id}/audio`, {
		headers: { range: 'bytes=0-3' }
	});
	expect(part.status()).toBe(206);
	expect(part.headers()['content-disposition']).toBe(`inline; filename="track-${track.id}.wav"`);
	expect(part.headers()['x-content-type-options']).toBe('nosniff');
	expect((await part.body()).toString('latin1')).toBe('RIFF');
	const beyond = await request.get(`/api/tracks/${track.id}/audio`, {
		headers: { range: 'bytes=99999999-' }
	});
	expect(beyond.status()).toBe(416);
	expect(
		(await request.delete(`/api/tracks/${track.id}`, { headers: { origin: BASE } })).status()
	).toBe(204);
	await request.dispose();
});

test('an instructor reads the music but cannot change it', async ({ page }) => {
	await signIn(page, 'instructor');
	await page.goto('/music');
	await hydrated(page);
	await expect(page.getByTestId('library-count')).toContainText('tracks shown');
	await expect(page.getByTestId('drop-zone')).toHaveCount(0);
	await expect(grid(page).getByRole('button', { name: /Double the tempo/ })).toHaveCount(0);
	await grid(page).getByTestId('track-row').first().getByRole('link').click();
	await expect(page.getByTestId('player')).toBeVisible();
	// The waveform is decoded in the browser from the stored audio.
	await expect(page.getByTestId('waveform')).toBeVisible();
	await expect(page.getByRole('button', { name: 'Tap', exact: true })).toHaveCount(0);
	await expect(page.getByRole('button', { name: 'Save the facts' })).toHaveCount(0);
	await expect(page.getByTestId('track-dance-fits-slot')).toBeVisible();
	await expect(page.getByTestId('remove-track')).toHaveCount(0);
});

test('removing a track says first which evenings and verdicts use it, then asks for a tick', async ({
	page,
	playwright
}) => {
	// A track of our own, judged for a dance and played in the draft evening (evening 2).
	const dj = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(dj, 'dj');
	const song = generateSong({ bpm: 118, durationS: 6, seed: 31 });
	const made = await dj.post('/api/tracks', {
		headers: { origin: BASE },
		multipart: {
			file: {
				name: 'e2e-to-remove.wav',
				mimeType: 'audio/wav',
				buffer: Buffer.from(encodeWav(song.samples, song.sampleRate))
			},
			analysis: JSON.stringify({
				bpm: 118,
				offsetS: 0,
				confidence: 0.5,
				source: 'detected',
				meter: 4
			})
		}
	});
	expect(made.status()).toBe(201);
	const { track } = (await made.json()) as { track: { id: number; title: string } };
	const verdict = await dj.put('/api/fits', {
		headers: { origin: BASE },
		data: { trackId: track.id, danceId: 1, verdict: 'fits' }
	});
	expect(verdict.status()).toBe(200);
	const organiser = await playwright.request.newContext({ baseURL: BASE });
	await signInApi(organiser, 'organiser');
	const before = await (await organiser.get('/api/evenings/2/run-order')).json();
	const entry = { kind: 'dance', danceId: 1, trackId: track.id, durationS: 6 };
	const put = await organiser.put('/api/evenings/2/run-order', {
		headers: { origin: BASE },
		data: { version: before.runOrderVersion, entries: [...before.entries, entry] }
	});
	expect(put.status(), await put.text()).toBe(200);

	await signIn(page, 'dj');
	await page.goto(`/music/${track.id}`);
	await hydrated(page);
	const panel = page.getByTestId('remove-track');
	await panel.getByText('Remove this track from the library').click();
	await expect(panel.getByTestId('remove-track-evenings')).toContainText('New Year Beginners');
	await expect(panel.getByTestId('remove-track-verdicts')).toContainText(
		"The team's 1 verdict on it goes with it."
	);
	// Without the tick nothing goes.
	await panel.getByRole('button', { name: 'Remove the track' }).click();
	await expect(panel.getByRole('alert')).toContainText('Tick the box');
	expect((await dj.get(`/api/tracks/${track.id}`)).status()).toBe(200);
	await panel.getByLabel(/Yes, remove it for good/).check();
	await panel.getByRole('button', { name: 'Remove the track' }).click();
	await expect(page).toHaveURL(/\/music\?removed=/);
	await expect(page.getByRole('status').first()).toContainText(`Removed “${track.title}”`);
	expect((await dj.get(`/api/tracks/${track.id}`)).status()).toBe(404);
	// The evening keeps its entry, now without a track; then it is put back as it was.
	const after = await (await organiser.get('/api/evenings/2/run-order')).json();
	expect(after.entries.at(-1)).toMatchObject({ kind: 'dance', danceId: 1, trackId: null });
	const restored = await organiser.put('/api/evenings/2/run-order', {
		headers: { origin: BASE },
		data: { version: after.runOrderVersion, entries: before.entries }
	});
	expect(restored.status()).toBe(200);
	await dj.dispose();
	await organiser.dispose();
});

// Issue 15, "Music on a phone": at 390 px a row shows its title, tempo and length with nothing to
// scroll sideways, measured from the rendered page.
test('on a phone the table shows title, tempo and length without sideways scrolling', async ({
	page
}) => {
	// Signed in on a wide screen, where the sign-in helper finds its "Sign out" button.
	await signIn(page, 'dj');
	await page.setViewportSize({ width: 390, height: 844 });
	await page.goto('/music');
	await hydrated(page);
	const row = grid(page).getByTestId('track-row').first();
	await expect(row).toBeVisible();
	for (const column of ['title', 'bpm', 'durationS']) {
		const box = (await row.locator(`[data-column="${column}"]`).boundingBox())!;
		expect(box.x, column).toBeGreaterThanOrEqual(0);
		expect(box.x + box.width, column).toBeLessThanOrEqual(390);
	}
	await expect(row.locator('[data-column="artist"]')).toHaveCount(0);
	await expect(row.locator('[data-column="durationS"]')).toHaveText(/^\d+:\d\d$/);
	const sideways = await grid(page)
		.locator('.overflow-auto')
		.evaluate((el) => el.scrollWidth - el.clientWidth);
	expect(sideways).toBeLessThanOrEqual(0);
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
	// The header is one row: the name and a menu that holds the rest.
	const header = (await page.locator('header').boundingBox())!;
	expect(header.height).toBeLessThanOrEqual(80);
	await page.getByTestId('phone-menu').getByText('Menu').click();
	await page.getByTestId('phone-menu').getByRole('link', { name: 'Dances' }).click();
	await expect(page).toHaveURL(/\/dances$/);
});
