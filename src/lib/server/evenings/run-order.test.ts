// Run-order saves and planning against a real SQLite with seeded-like data.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { makeTestDb } from '../testing/test-db';
import { EveningError } from './errors';
import { loadEvening } from './load';
import { entriesOf, planAndSave, planFor } from './plan';
import { planInputFor } from './plan-input';
import { refuseStaleSave, saveRunOrder } from './run-order';
import { runOrderSave } from '../../schemas/evening';
import { seedLike } from './test-fixture';
import { updateEvening } from './write';
import { answerRequest, listRequests } from '../dances/requests';

let cleanup: () => void;
let refs: ReturnType<typeof seedLike>;
beforeEach(() => {
	const t = makeTestDb();
	cleanup = t.cleanup;
	refs = seedLike(t.db);
});
afterEach(() => cleanup());

const danceId = (name: string) => refs.danceRows.find((d) => d.name === name)!.id;

function status(fn: () => unknown): number {
	try {
		fn();
	} catch (e) {
		if (e instanceof EveningError) return e.status;
		throw e;
	}
	return 200;
}

describe('run-order save', () => {
	test('saves, recomputes start times and bumps the version', () => {
		const e = loadEvening(1)!;
		const lesson = e.sections[0];
		const track = refs.trackRows[0];
		const result = saveRunOrder(1, e.runOrderVersion, [
			{
				kind: 'teach',
				sectionId: lesson.id,
				rate: 1,
				durationS: 600,
				locked: false,
				text: 'Teach',
				reasons: []
			},
			{
				kind: 'dance',
				sectionId: lesson.id,
				danceId: danceId('Marrowby Lantern Waltz'),
				trackId: track.id,
				rate: 0.9,
				durationS: 1,
				locked: true,
				text: '',
				reasons: []
			},
			{
				kind: 'announcement',
				sectionId: lesson.id,
				rate: 1,
				durationS: 0,
				locked: false,
				text: 'Welcome',
				reasons: []
			}
		]);
		expect(result.runOrderVersion).toBe(e.runOrderVersion + 1);
		const saved = loadEvening(1)!.entries;
		expect(saved).toHaveLength(3);
		// Plain arithmetic with the default 15 s changeover: 0; 600 + 15; 615 + duration ÷ 0.9 + 15.
		const danceS = track.durationS / 0.9;
		expect(saved[1].durationS).toBeCloseTo(danceS, 2);
		expect(saved.map((x) => x.startS)).toEqual([0, 615, expect.closeTo(615 + danceS + 15, 2)]);
		// An announcement with no length given gets the default minute.
		expect(saved[2].durationS).toBe(60);
		expect(saved[1].locked).toBe(true);
	});

	test('the early check: the current version passes, an older one is 409, no evening is 404', () => {
		const v = loadEvening(1)!.runOrderVersion;
		expect(status(() => refuseStaleSave(1, v))).toBe(200);
		expect(status(() => refuseStaleSave(1, v - 1))).toBe(409);
		expect(status(() => refuseStaleSave(999, v))).toBe(404);
	});

	test('two editors: the second save with the old version gets 409 and the first is kept', () => {
		const v = loadEvening(1)!.runOrderVersion;
		const mine = [
			{
				kind: 'announcement' as const,
				rate: 1,
				durationS: 60,
				locked: false,
				text: 'Alice',
				reasons: []
			}
		];
		const theirs = [
			{
				kind: 'announcement' as const,
				rate: 1,
				durationS: 60,
				locked: false,
				text: 'Bob',
				reasons: []
			}
		];
		saveRunOrder(1, v, mine);
		expect(status(() => saveRunOrder(1, v, theirs))).toBe(409);
		const after = loadEvening(1)!;
		expect(after.entries.map((x) => x.text)).toEqual(['Alice']);
		expect(after.runOrderVersion).toBe(v + 1);
		// After reloading (the new version) Bob's save goes through.
		saveRunOrder(1, after.runOrderVersion, [...mine, ...theirs]);
		expect(loadEvening(1)!.entries.map((x) => x.text)).toEqual(['Alice', 'Bob']);
	});

	test('a locked entry sent through the schema keeps its pinned start', () => {
		const v = loadEvening(1)!.runOrderVersion;
		const body = runOrderSave.parse({
			version: v,
			entries: [
				{ kind: 'announcement', durationS: 60, text: 'Welcome' },
				{ kind: 'break', durationS: 300, locked: true, startS: 900, title: 'Water' }
			]
		});
		saveRunOrder(1, v, body.entries);
		const saved = loadEvening(1)!.entries;
		// Unpinned it would start at 60 + 15 = 75 s; pinned, at 900 s. The planner's title is the text.
		expect(saved[1]).toMatchObject({ startS: 900, text: 'Water', locked: true });
	});

	test('unknown references and tracks the team refused are 422', () => {
		const v = loadEvening(1)!.runOrderVersion;
		const dance = (d: number, t: number) => ({
			kind: 'dance' as const,
			danceId: d,
			trackId: t,
			rate: 1,
			durationS: 0,
			locked: false,
			text: '',
			reasons: []
		});
		expect(status(() => saveRunOrder(1, v, [dance(99999, refs.trackRows[0].id)]))).toBe(422);
		expect(status(() => saveRunOrder(1, v, [dance(refs.danceRows[0].id, 99999)]))).toBe(422);
		expect(
			status(() => saveRunOrder(1, v, [{ ...dance(1, 1), kind: 'break', sectionId: 99999 }]))
		).toBe(422);
		expect(status(() => saveRunOrder(999, 1, []))).toBe(404);
		expect(loadEvening(1)!.runOrderVersion).toBe(v);
	});
});

describe('planning from the database', () => {
	test('the input carries sections in seconds, requests, fits and verdicts', () => {
		const input = planInputFor(1, 7);
		// 19:00–23:00 is 4 h; the tea break 20:50–21:05 is 6600–7500 s (plain arithmetic).
		expect(input.evening.sections.find((s) => s.kind === 'break')).toMatchObject({
			startS: 6600,
			endS: 7500
		});
		expect(input.evening.sections[0].danceId).toBe(danceId('Marrowby Lantern Waltz'));
		expect(input.requests).toEqual([{ danceId: danceId('Saltmarsh Swing') }]);
		expect(input.seed).toBe(7);
		expect(input.fits.some((f) => f.verdict === 'fits')).toBe(true);
		expect(input.fits.every((f) => f.score >= 0 && f.score <= 1)).toBe(true);
	});

	test('an accepted request weighs double, comes first, and brings its answered track', () => {
		const swing = danceId('Saltmarsh Swing');
		const track = refs.trackRows[2].id;
		const [asked] = listRequests({ id: 0, name: '', email: '', roles: ['organiser'] }).filter(
			(r) => r.danceId === swing && r.eveningId === 1
		);
		expect(
			answerRequest(asked.id, { status: 'planned', answer: 'After the break', trackId: track })
		).toBe(true);
		const input = planInputFor(1, 7);
		expect(input.requests).toEqual([{ danceId: swing, weight: 2, first: true }]);
		expect(input.mustPlay).toContainEqual({ danceId: swing, trackId: track });
		const [answered] = listRequests({ id: 0, name: '', email: '', roles: ['dj'] }).filter(
			(r) => r.id === asked.id
		);
		expect(answered).toMatchObject({
			status: 'planned',
			answer: 'After the break',
			answerTrackId: track
		});
		expect(answered.answeredAt).not.toBeNull();
		// Declined, it leaves the planner's input; reopened, the answer's time is cleared.
		answerRequest(asked.id, { status: 'declined' });
		expect(planInputFor(1, 7).requests).toEqual([]);
		answerRequest(asked.id, { status: 'open' });
		const reopened = listRequests({ id: 0, name: '', email: '', roles: ['dj'] });
		expect(reopened.find((r) => r.id === asked.id)).toMatchObject({
			answeredAt: null,
			answer: 'After the break'
		});
	});

	test('a plan fits its dances, is deterministic and keeps a locked entry', () => {
		// An iteration budget (not the wall clock) bounds the search, so the same seed gives the same plan.
		updateEvening(1, { planSettings: { settings: { iterations: 400, timeBudgetMs: 10_000 } } });
		const first = planFor(1, 3);
		expect(first.entries.length).toBeGreaterThan(10);
		expect(first.violations).toEqual([]);
		const again = planFor(1, 3);
		expect(again.entries.map((e) => [e.kind, e.danceId, e.trackId])).toEqual(
			first.entries.map((e) => [e.kind, e.danceId, e.trackId])
		);
		// Lock one open-floor dance in the editor's draft, then re-plan with another seed.
		const draft = entriesOf(first);
		const at = draft.findIndex((e, i) => e.kind === 'dance' && i > 5);
		draft[at].locked = true;
		const locked = draft[at];
		const replanned = planFor(1, 11, { entries: draft });
		const kept = replanned.entries.filter((e) => e.locked);
		expect(kept).toHaveLength(1);
		expect(kept[0]).toMatchObject({
			danceId: locked.danceId,
			trackId: locked.trackId,
			kind: 'dance'
		});
		// Every dance's track is one the fit engine or the team passed (the planner's hard rule).
		const input = planInputFor(1, 11);
		for (const e of replanned.entries.filter((x) => x.kind === 'dance' && !x.locked)) {
			const fit = input.fits.find((f) => f.danceId === e.danceId && f.trackId === e.trackId);
			expect(
				fit && (fit.verdict === 'fits' || fit.verdict === 'fits-at-rate' || fit.score >= 0.5)
			).toBeTruthy();
		}
	});

	test("never-play dances stay out and must-play dances get in (the evening's planSettings)", () => {
		const usual = planFor(1, 4);
		const played = [...new Set(usual.entries.map((e) => e.danceId).filter(Boolean))] as number[];
		const banned = played.find((d) => d !== danceId('Marrowby Lantern Waltz'))!;
		const unplayed = refs.danceRows.find((d) => !played.includes(d.id))!.id;
		updateEvening(1, {
			planSettings: { mustPlay: [unplayed], neverPlay: { danceIds: [banned] } }
		});
		const input = planInputFor(1, 4);
		expect(input.mustPlay).toEqual([unplayed]);
		const result = planFor(1, 4);
		const ids = result.entries.map((e) => e.danceId);
		expect(ids).not.toContain(banned);
		// The must-play dance had no place in the usual plan; now it is in.
		expect(ids).toContain(unplayed);
	});

	test('planAndSave writes the run order; saved locks survive the next planAndSave', () => {
		const saved = planAndSave(1, 5);
		const e = loadEvening(1)!;
		expect(e.entries.length).toBe(saved.count);
		expect(e.runOrderVersion).toBe(saved.runOrderVersion);
		const i = e.entries.findIndex((x, k) => x.kind === 'dance' && k > 4);
		const entries = entriesOf(saved.plan).map((x, k) => ({ ...x, locked: k === i }));
		saveRunOrder(1, e.runOrderVersion, entries);
		const lockedStart = loadEvening(1)!.entries[i].startS;
		planAndSave(1, 99);
		const after = loadEvening(1)!.entries;
		const lock = after.find((x) => x.locked)!;
		expect(lock.trackId).toBe(entries[i].trackId);
		expect(lock.startS).toBeCloseTo(lockedStart, 0);
	});
});
