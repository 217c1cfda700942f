// Random evenings for the planner's property tests, built deterministically from a shape that
// fast-check draws (so failures shrink to small shapes), with invented names only.
import type { CrowdMix, SectionKind } from '../domain';
import { inventCatalogue, inventFits, inventTracks } from './invented';
import { createRng } from './rng';
import type { LockedEntry, PlanInput, PlanResult, PlanSection } from './types';

export interface Shape {
	seed: number;
	dances: number;
	tracks: number;
	perTrack: number;
	minutes: number;
	kinds: SectionKind[];
	weights: number[];
	gaps: boolean[];
	crowd: CrowdMix;
	settings: {
		repeatWindowMin: number;
		breakEveryMin: number;
		breakLengthMin: number;
		maxConsecutiveFast: number;
		gapS: number;
		endToleranceS: number;
		teachLengthMin: number;
		walkthroughLengthMin: number;
		iterations: number;
		seed: number;
	};
	requests: number;
	must: number;
	never: number;
	locks: number;
	generous?: boolean;
}

/** Sections in the order drawn, sharing the evening by weight, some with a gap between. */
function sectionsFor(shape: Shape, lessonDance: number): PlanSection[] {
	const kinds: SectionKind[] = shape.kinds.length
		? shape.kinds
		: ['lesson', 'open-floor', 'request-block', 'break', 'open-floor', 'last-dance'];
	const total = shape.minutes * 60;
	// Enough-music evenings keep the usual proportions (a 3/16 lesson, a short last dance).
	const w = shape.kinds.length ? kinds.map((_, i) => shape.weights[i]) : [3, 4, 2, 1, 5, 1];
	const sum = w.reduce((a, b) => a + b, 0);
	let t = 0;
	return kinds.map((kind, i) => {
		const start = t + (shape.gaps[i] && i > 0 ? 120 : 0);
		const end =
			i === kinds.length - 1 ? total : Math.max(start + 60, Math.round(t + (w[i] / sum) * total));
		t = end;
		return {
			id: `s${i}`,
			kind,
			startS: start,
			endS: Math.min(end, total),
			...(kind === 'lesson' ? { danceId: lessonDance } : {})
		};
	});
}

export function inputFor(shape: Shape): PlanInput {
	const rng = createRng(shape.seed);
	const dances = inventCatalogue(rng, shape.dances);
	const tracks = inventTracks(rng, shape.tracks);
	const fits = inventFits(rng, dances, tracks, shape.perTrack);
	const count = new Map<number | string, number>();
	for (const f of fits)
		if (f.verdict !== 'does-not-fit' && f.rate === 1)
			count.set(f.danceId, (count.get(f.danceId) ?? 0) + 1);
	const rich = dances.filter((d) => (count.get(d.id) ?? 0) >= 3);
	const lesson = (rich.length ? rich : dances)[rng.int(rich.length || dances.length)];
	const sections = sectionsFor(shape, Number(lesson.id));
	const pick = <T>(xs: T[]) => xs[rng.int(xs.length)];
	const start = Date.UTC(2026, 11, 5, 19, 0);
	return {
		evening: {
			startsAt: start,
			endsAt: new Date(start + shape.minutes * 60_000).toISOString(),
			crowd: shape.crowd,
			sections
		},
		dances,
		tracks,
		fits,
		requests: Array.from({ length: shape.requests }, () => ({
			danceId: pick(dances).id,
			...(rng.next() < 0.5 ? { sectionId: pick(sections).id } : {})
		})),
		mustPlay: Array.from({ length: shape.must }, () => pick(dances).id),
		neverPlay: shape.generous
			? {}
			: {
					danceIds: Array.from({ length: shape.never }, () => pick(dances).id).filter(
						(id) => id !== lesson.id
					),
					trackIds: Array.from({ length: shape.never }, () => pick(tracks).id)
				},
		settings: { ...shape.settings, timeBudgetMs: 1e9 }
	};
}

export function locksFrom(plan: PlanResult, shape: Shape): LockedEntry[] {
	const rng = createRng(shape.seed + 1);
	const locks: LockedEntry[] = [];
	for (let k = 0; k < shape.locks && plan.entries.length; k++) {
		const e = plan.entries[rng.int(plan.entries.length)];
		if (locks.some((l) => l.position === e.position)) continue;
		locks.push({
			position: e.position,
			startS: e.startS,
			entry: {
				kind: e.kind,
				danceId: e.danceId,
				trackId: e.trackId,
				durationS: e.durationS,
				rate: e.rate,
				sectionId: e.sectionId
			}
		});
	}
	return locks;
}
