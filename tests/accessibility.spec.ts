// Every page of the page matrix, opened as a person who may read it, checked with axe-core
// (Deque's engine, through @axe-core/playwright) against the WCAG 2.1 A and AA rules it knows:
// no violation of serious or critical impact (issue 15). Wide and phone-sized, since the two
// layouts differ (the header menu, the run order, the music table).
import AxeBuilder from '@axe-core/playwright';
import { expect, test } from '@playwright/test';
import { hydrated, signIn, type DemoRole } from './helpers';
import { PAGES, type Allowed } from './page-matrix';

/** Someone who may open a page: signed out for public pages, else the first allowed role. */
function reader(allowed: Allowed): DemoRole | null {
	if (allowed === 'public') return null;
	if (allowed === 'everyone signed in') return 'dancer';
	return allowed[0];
}

let share = '';
test.beforeAll(async ({ browser }) => {
	const page = await browser.newPage();
	await signIn(page, 'organiser');
	share = (await (await page.request.get('/api/evenings/1')).json()).shareToken ?? '';
	await page.close();
});

for (const row of PAGES) {
	test(`no serious or critical axe violation on ${row.path}`, async ({ page }) => {
		const who = reader(row.allowed);
		if (who) await signIn(page, who);
		for (const width of [1366, 390]) {
			await page.setViewportSize({ width, height: 844 });
			await page.goto(row.path.replace('{share}', share));
			await hydrated(page);
			const result = await new AxeBuilder({ page })
				.withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
				.analyze();
			const bad = result.violations
				.filter((v) => v.impact === 'serious' || v.impact === 'critical')
				.map((v) => `${v.id} (${v.impact}): ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
			expect(bad, `${row.path} as ${who ?? 'signed out'} at ${width} px`).toEqual([]);
		}
	});
}
