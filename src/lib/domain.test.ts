// The words on screen for the domain's lists: every value has one, capitalised, and none shows
// a slug (issue 15, "no raw slugs on screen").
import { expect, test } from 'vitest';
import { RHYTHMS, RHYTHM_LABELS } from './domain';

test('every rhythm has a label people write, never its slug', () => {
	for (const r of RHYTHMS) {
		const label = RHYTHM_LABELS[r];
		expect(label[0], r).toBe(label[0].toUpperCase());
		// A hyphen only where the trade writes one (two-step, cha-cha), never a slug's chain.
		expect(label, r).not.toMatch(/\w-\w+-\w/);
		expect(label, r).not.toBe(r);
	}
	expect(RHYTHM_LABELS['east-coast-swing']).toBe('East coast swing');
	expect(RHYTHM_LABELS['triple-two-step']).toBe('Triple two-step');
});
