// A deterministic generator of invented catalogues, music and evenings, for the planner's tests
// and benchmark. Every name is made up from syllables; no real dance, song or artist.
import { LEVELS, type CrowdMix, type Level, type Rhythm } from '../domain';
import { createRng, type Rng } from './rng';
import type { PlanDance, PlanFit, PlanInput, PlanSection, PlanTrack } from './types';

// Country-western ranges as teachers quote them (common practice, no source; rhythm-presets.ts):
// two-step 182–198, waltz 84–100,
// west coast swing 112–128, cha-cha 100–116, east coast swing 142–158, polka 114–130. The others
// are invented for the demo (no citable range: common practice, from memory).
const BANDS: [Rhythm, number, number][] = [
	['two-step', 182, 198],
	['waltz', 84, 100],
	['west-coast-swing', 112, 128],
	['cha-cha', 100, 116],
	['east-coast-swing', 142, 158],
	['polka', 114, 130],
	['triple-two-step', 160, 180],
	['nightclub', 96, 112],
	['shuffle', 120, 140],
	['rock', 130, 150]
];

const SYL = [
	'ka',
	'lo',
	'mi',
	'ren',
	'to',
	'sa',
	'vel',
	'dor',
	'fin',
	'bri',
	'zu',
	'pa',
	'nor',
	'el',
	'qui',
	'tam'
];

function word(rng: Rng, parts: number): string {
	let w = '';
	for (let i = 0; i < parts; i++) w += SYL[rng.int(SYL.length)];
	return w.charAt(0).toUpperCase() + w.slice(1);
}

export interface InventOptions {
	seed: number;
	dances: number;
	tracks: number;
	/** Evening length in minutes (sections are laid out to fill it). */
	minutes?: number;
	crowd?: CrowdMix;
	/** How many dances each track suits at most (keeps the fit list realistic). */
	fitsPerTrack?: number;
}

export function inventCatalogue(rng: Rng, n: number): PlanDance[] {
	return Array.from({ length: n }, (_, i) => {
		const [rhythm, lo, hi] = BANDS[rng.int(BANDS.length)];
		const width = 6 + rng.int(8);
		const bpmMin = lo + rng.int(Math.max(1, hi - lo - width));
		const level: Level = LEVELS[Math.min(4, Math.floor(rng.next() * rng.next() * 6))];
		return {
			id: i + 1,
			name: `${word(rng, 2)} ${word(rng, 1)}`,
			level,
			rhythm,
			counts: [16, 32, 32, 32, 48, 64][rng.int(6)],
			walls: [1, 2, 4, 4][rng.int(4)],
			bpmMin,
			bpmMax: bpmMin + width,
			wellKnown: rng.next() < 0.25
		};
	});
}

export function inventTracks(rng: Rng, n: number): PlanTrack[] {
	return Array.from({ length: n }, (_, i) => {
		const [, lo, hi] = BANDS[rng.int(BANDS.length)];
		return {
			id: 100_000 + i,
			title: `${word(rng, 2)} ${word(rng, 2)}`,
			artist: `The ${word(rng, 2)}s`,
			durationS: 150 + rng.int(150),
			bpm: lo - 8 + rng.int(hi - lo + 16)
		};
	});
}

/** Fits for tracks whose tempo lies in a dance's range, or near it at a rate (as the fit engine
 * would report them), with a phrasing score and some team verdicts. */
export function inventFits(
	rng: Rng,
	dances: PlanDance[],
	tracks: PlanTrack[],
	perTrack: number
): PlanFit[] {
	const fits: PlanFit[] = [];
	for (const t of tracks) {
		const bpm = t.bpm ?? 0;
		let count = 0;
		const startAt = rng.int(dances.length);
		for (let k = 0; k < dances.length && count < perTrack; k++) {
			const d = dances[(startAt + k) % dances.length];
			const inRange = bpm >= d.bpmMin && bpm <= d.bpmMax;
			const mid = (d.bpmMin + d.bpmMax) / 2;
			const rate = Math.round((mid / bpm) * 100) / 100;
			const nearRange = !inRange && rate >= 0.92 && rate <= 1.08;
			if (!inRange && !nearRange) continue;
			count++;
			const score = Math.round((0.35 + rng.next() * 0.65) * 100) / 100;
			const roll = rng.next();
			fits.push({
				trackId: t.id,
				danceId: d.id,
				score,
				verdict: nearRange
					? 'fits-at-rate'
					: roll < 0.1
						? 'fits'
						: roll < 0.13
							? 'does-not-fit'
							: null,
				rate: nearRange ? rate : 1,
				lessonRate: roll > 0.8 ? 0.85 : null
			});
		}
	}
	return fits;
}

/** A night of the usual shape, scaled to `minutes`: lesson, open floor, request block, break,
 * open floor, last dance. */
export function inventSections(minutes: number, lessonDance: number): PlanSection[] {
	const m = (x: number) => Math.round((x / 240) * minutes) * 60;
	return [
		{ id: 's1', kind: 'lesson', startS: 0, endS: m(45), danceId: lessonDance, title: 'Lesson' },
		{ id: 's2', kind: 'open-floor', startS: m(45), endS: m(105), title: 'Open floor' },
		{ id: 's3', kind: 'request-block', startS: m(105), endS: m(135), title: 'Requests' },
		{ id: 's4', kind: 'break', startS: m(135), endS: m(150), title: 'Break' },
		{ id: 's5', kind: 'open-floor', startS: m(150), endS: m(235), title: 'Open floor' },
		{ id: 's6', kind: 'last-dance', startS: m(235), endS: m(240), title: 'Last dance' }
	];
}

export function inventEvening(opts: InventOptions): PlanInput {
	const rng = createRng(opts.seed);
	const dances = inventCatalogue(rng, opts.dances);
	const tracks = inventTracks(rng, opts.tracks);
	const fits = inventFits(rng, dances, tracks, opts.fitsPerTrack ?? 6);
	const fitCount = new Map<number | string, number>();
	for (const f of fits)
		if (f.verdict !== 'does-not-fit') fitCount.set(f.danceId, (fitCount.get(f.danceId) ?? 0) + 1);
	const easy = dances.filter((d) => LEVELS.indexOf(d.level) <= 1 && (fitCount.get(d.id) ?? 0) >= 3);
	const lesson = (easy.length ? easy : dances)[rng.int(Math.max(1, easy.length || dances.length))];
	const start = Date.UTC(2026, 11, 5, 19, 0, 0);
	const minutes = opts.minutes ?? 240;
	const requests = Array.from({ length: 4 }, () => ({
		danceId: dances[rng.int(dances.length)].id,
		sectionId: 's3'
	}));
	return {
		evening: {
			startsAt: new Date(start).toISOString(),
			endsAt: new Date(start + minutes * 60_000).toISOString(),
			crowd: opts.crowd ?? 'mixed',
			sections: inventSections(minutes, Number(lesson.id))
		},
		dances,
		tracks,
		fits,
		requests,
		mustPlay: [dances[rng.int(dances.length)].id],
		neverPlay: { danceIds: [dances[rng.int(dances.length)].id], trackIds: [tracks[0].id] }
	};
}
