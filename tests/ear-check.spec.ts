// "Check by ear" (issue 11): a track whose two metrical levels measured nearly alike shows both
// tempi, the click-along plays on the beats, one click moves it to the other reading, and the
// DJ's choice settles it. The library filters the tracks still to check.
import { expect, test } from '@playwright/test';
import { BASE, hydrated, signIn } from './helpers';

test('a track to check by ear: both tempi, a click-along, one click to switch, a choice kept', async ({
	page
}) => {
	await signIn(page, 'dj');
	const list = await page.request.get('/api/tracks?q=&limit=1&sort=title');
	const [track] = (
		(await list.json()) as { items: { id: number; bpm: number; version: number; title: string }[] }
	).items;
	const alt = Math.round(track.bpm * 2 * 100) / 100;
	const marked = await page.request.patch(`/api/tracks/${track.id}`, {
		data: { version: track.version, altBpm: alt },
		headers: { origin: BASE }
	});
	expect(marked.status()).toBe(200);

	await page.goto('/music');
	await hydrated(page);
	await page.getByTestId('ear-only').check();
	await expect(page.getByTestId('library-count')).toHaveText(/^1 of \d+ tracks shown/);
	await expect(page.getByTestId('check-by-ear-mark')).toHaveText(`or ${alt}? check by ear`);

	await page.goto(`/music/${track.id}`);
	await hydrated(page);
	await expect(page.getByTestId('check-by-ear')).toContainText(`${track.bpm} BPM`);
	await expect(page.getByTestId('check-by-ear')).toContainText(`${alt} BPM`);
	const [measured, other] = await page.getByTestId('reading').all();
	await expect(measured).toHaveAttribute('aria-pressed', 'true');
	await other.click();
	await expect(other).toHaveAttribute('aria-pressed', 'true');
	await expect(measured).toHaveAttribute('aria-pressed', 'false');

	await page.getByTestId('click-toggle').click();
	// The clicks are scheduled on the audio clock while the track plays.
	await expect
		.poll(async () => Number(await page.getByTestId('click-along').getAttribute('data-clicks')), {
			timeout: 10_000
		})
		.toBeGreaterThan(3);
	await page.getByTestId('click-toggle').click();

	await page.getByRole('button', { name: `Keep ${alt} BPM` }).click();
	await expect(page.getByTestId('track-bpm')).toHaveText(String(alt));
	await expect(page.getByTestId('check-by-ear')).toHaveCount(0);

	// Put the demo track back as it was for the other tests.
	const now = (
		(await (await page.request.get(`/api/tracks/${track.id}`)).json()) as {
			track: { version: number };
		}
	).track;
	const back = await page.request.patch(`/api/tracks/${track.id}`, {
		data: { version: now.version, bpm: track.bpm, bpmSource: 'detected' },
		headers: { origin: BASE }
	});
	expect(back.status()).toBe(200);
});
