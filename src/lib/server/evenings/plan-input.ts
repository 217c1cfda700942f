// Assembles the planner's input for one evening from the database: sections in seconds from the
// start, the catalogue, fits (team verdicts and computed scores), requests, must-play and
// never-play lists, settings, and the locked entries of the current (or the editor's) run order.
import { and, eq, inArray, isNotNull } from 'drizzle-orm';
import { DEFAULT_DURATION_S, recomputeStarts } from '../../run-order/timing';
import { rankFits } from '../../fit';
import type { LockedEntry, PlanFit, PlanInput } from '../../planner';
import type { EntryInput } from '../../schemas/evening';
import { db } from '../db';
import { requests } from '../db/schema';
import { danceFacts, playable, readCatalogue, trackFacts, verdictsOfDance } from './catalogue';
import { EveningError } from './errors';
import { gapSeconds } from './gap';
import { loadEvening } from './load';

/**
 * How many computed fits per dance the planner sees. The planner only plays fits above its
 * threshold; past the best 60 per dance extra candidates add time, not better evenings.
 */
const FITS_PER_DANCE = 60;
/** Computed scores below this never reach the planner (its default threshold is 0.5). */
const MIN_SCORE = 0.3;

interface Draft {
	entries: readonly EntryInput[];
}

function computedFits(cat: ReturnType<typeof readCatalogue>): PlanFit[] {
	// A track whose audio is missing keeps its places but is offered for none.
	const facts = cat.tracks.filter(playable).map(trackFacts);
	const lessonRate = new Map(cat.fitRows.map((f) => [`${f.danceId}:${f.trackId}`, f.lessonRate]));
	const out: PlanFit[] = [];
	for (const d of cat.dances) {
		const items = rankFits(
			danceFacts(d),
			facts,
			verdictsOfDance(cat.fitRows, d.id),
			null,
			FITS_PER_DANCE
		);
		for (const item of items) {
			if (item.verdict === 'does-not-fit') continue;
			if (!item.verdict && item.score < MIN_SCORE) continue;
			out.push({
				trackId: item.trackId,
				danceId: item.danceId,
				score: item.score,
				verdict: item.verdict,
				rate: item.tempo.rate,
				lessonRate: lessonRate.get(`${d.id}:${item.trackId}`) ?? null
			});
		}
	}
	// The team's "does not fit" still reaches the planner, so it can say why a pairing is out.
	for (const f of cat.fitRows) {
		if (f.verdict === 'does-not-fit')
			out.push({ trackId: f.trackId, danceId: f.danceId, score: 0, verdict: f.verdict });
	}
	return out;
}

function lockedFrom(
	entries: readonly EntryInput[],
	trackLength: Map<number, number>,
	sectionStarts: { id: number; startS: number }[],
	gapS: number
): LockedEntry[] {
	const durations = entries.map((e) =>
		e.kind === 'dance' && e.trackId != null && trackLength.has(e.trackId)
			? trackLength.get(e.trackId)! / e.rate
			: e.durationS > 0
				? e.durationS
				: DEFAULT_DURATION_S[e.kind]
	);
	const starts = recomputeStarts(
		entries.map((e, i) => ({ ...e, durationS: durations[i] })),
		sectionStarts,
		gapS
	);
	const locked: LockedEntry[] = [];
	entries.forEach((e, position) => {
		if (!e.locked) return;
		locked.push({
			position,
			startS: starts[position],
			entry: {
				kind: e.kind,
				danceId: e.danceId ?? null,
				trackId: e.trackId ?? null,
				durationS: durations[position],
				rate: e.rate,
				sectionId: e.sectionId ?? null,
				...(e.text ? { title: e.text } : {})
			}
		});
	});
	return locked;
}

/** The planner's input for the evening; `draft` replaces the saved run order's locks. */
export function planInputFor(eveningId: number, seed?: number, draft?: Draft): PlanInput {
	const evening = loadEvening(eveningId);
	if (!evening) throw new EveningError('There is no such evening.', 404);
	const start = Date.parse(evening.startsAt);
	const cat = readCatalogue();
	const ps = evening.planSettings;
	const sectionStarts = evening.sections.map((s) => ({
		id: s.id,
		startS: (Date.parse(s.startsAt) - start) / 1000
	}));
	const wanted = db()
		.select({
			danceId: requests.danceId,
			status: requests.status,
			trackId: requests.answerTrackId
		})
		.from(requests)
		.where(
			and(
				eq(requests.eveningId, eveningId),
				eq(requests.kind, 'dance'),
				isNotNull(requests.danceId),
				inArray(requests.status, ['open', 'planned'])
			)
		)
		.all();
	const trackLength = new Map(cat.tracks.map((t) => [t.id, t.durationS]));
	const current: EntryInput[] = draft
		? [...draft.entries]
		: evening.entries.map((e) => ({
				kind: e.kind,
				sectionId: e.sectionId,
				danceId: e.danceId,
				trackId: e.trackId,
				rate: e.rate,
				durationS: e.durationS,
				startS: e.startS,
				locked: e.locked,
				text: e.text,
				reasons: e.reasons
			}));
	return {
		evening: {
			startsAt: start,
			endsAt: Date.parse(evening.endsAt),
			crowd: evening.crowd,
			sections: evening.sections.map((s, i) => ({
				id: s.id,
				kind: s.kind,
				startS: sectionStarts[i].startS,
				endS: (Date.parse(s.endsAt) - start) / 1000,
				...(s.danceId ? { danceId: s.danceId } : {}),
				title: s.title
			}))
		},
		dances: cat.dances.map((d) => ({
			id: d.id,
			name: d.name,
			level: d.level,
			rhythm: danceFacts(d).rhythm,
			counts: d.counts,
			walls: d.walls,
			bpmMin: d.bpmMin,
			bpmMax: d.bpmMax,
			wellKnown: d.wellKnown,
			formation: d.formation
		})),
		tracks: cat.tracks.map((t) => ({
			id: t.id,
			title: t.title,
			artist: t.artist,
			durationS: t.durationS,
			bpm: t.bpm
		})),
		fits: computedFits(cat),
		// Accepted requests ("planned") weigh double and come first in the request block; the
		// track the team answered with is played for it.
		requests: wanted.map((r) =>
			r.status === 'planned'
				? { danceId: r.danceId!, weight: 2, first: true }
				: { danceId: r.danceId! }
		),
		mustPlay: [
			...(ps.mustPlay ?? []),
			...wanted.flatMap((r) =>
				r.status === 'planned' && r.trackId !== null
					? [{ danceId: r.danceId!, trackId: r.trackId }]
					: []
			)
		],
		neverPlay: ps.neverPlay ?? {},
		locked: lockedFrom(current, trackLength, sectionStarts, gapSeconds(evening.planSettings)),
		settings: ps.settings ?? {},
		seed: seed ?? ps.seed ?? 1
	};
}
