// Checks any run order (planned, or edited by hand) against the hard rules, from the public input
// and entries alone. It shares no code with the search, so the tests use it as an independent
// judge, and the editor can use it to warn about a hand-made change.
import { fitIsPlayable } from './prepare';
import { resolveSettings, restLimitS, restSettingWords } from './settings';
import { eveningLengthS } from './time';
import type { Id, PlanEntry, PlanInput } from './types';

const EPS = 1e-6;

export interface RunOrderProblem {
	rule:
		| 'fit'
		| 'never-play'
		| 'duration'
		| 'overlap'
		| 'section-time'
		| 'evening-end'
		| 'repeat'
		| 'track-twice'
		| 'break'
		| 'advanced-run'
		| 'partner-twice'
		| 'lesson'
		| 'reprise'
		| 'lock';
	position: number;
	message: string;
}

export function checkRunOrder(input: PlanInput, entries: PlanEntry[]): RunOrderProblem[] {
	const s = resolveSettings(input);
	const out: RunOrderProblem[] = [];
	const add = (rule: RunOrderProblem['rule'], position: number, message: string) =>
		out.push({ rule, position, message });
	const eveningS = eveningLengthS(input.evening.startsAt, input.evening.endsAt);
	const dances = new Map(input.dances.map((d) => [d.id, d]));
	const tracks = new Map(input.tracks.map((t) => [t.id, t]));
	const fits = new Map<string, (typeof input.fits)[number]>();
	for (const f of input.fits) {
		const key = `${f.danceId}|${f.trackId}`;
		if (!fits.has(key)) fits.set(key, f);
	}
	const neverD = new Set<Id>(input.neverPlay?.danceIds ?? []);
	const neverT = new Set<Id>(input.neverPlay?.trackIds ?? []);
	const sections = [...input.evening.sections].sort((a, b) => a.startS - b.startS);
	const lessonIds = new Set(sections.filter((x) => x.kind === 'lesson').map((x) => x.id));
	const lastStart = new Map<Id, number>();
	const seenTracks = new Set<Id>();
	let dancing = 0;
	let adv = 0;
	let prevPartner = false;
	let prevEnd = -Infinity;
	entries.forEach((e, i) => {
		const end = e.startS + e.durationS;
		if (e.startS < prevEnd - EPS)
			add('overlap', i, `Entry ${i + 1} starts before the one before it ends.`);
		if (e.startS - prevEnd >= s.breakLengthMin * 60) {
			dancing = 0;
			prevPartner = false;
		}
		prevEnd = end;
		if (end > eveningS + EPS && !e.locked)
			add('evening-end', i, `Entry ${i + 1} ends after the evening.`);
		if (e.kind === 'break') {
			dancing = 0;
			adv = 0;
			prevPartner = false;
			return;
		}
		if (e.kind === 'dance' || e.kind === 'walkthrough') {
			dancing += e.durationS;
			if (dancing > restLimitS(s) + EPS)
				add('break', i, `Entry ${i + 1} runs past ${restSettingWords(s)}.`);
		}
		if (e.kind !== 'dance' || e.danceId === null) return;
		const dance = dances.get(e.danceId);
		const inLesson = e.sectionId !== null && lessonIds.has(e.sectionId);
		const partner = dance?.formation === 'partner';
		if (!e.locked) {
			const fit = e.trackId === null ? undefined : fits.get(`${e.danceId}|${e.trackId}`);
			if (!fit || !fitIsPlayable(fit, s.fitThreshold))
				add('fit', i, `Entry ${i + 1}: the track does not fit the dance.`);
			if (neverD.has(e.danceId) || (e.trackId !== null && neverT.has(e.trackId))) {
				add('never-play', i, `Entry ${i + 1} is on the never-play list.`);
			}
			const track = e.trackId === null ? undefined : tracks.get(e.trackId);
			if (track && Math.abs(track.durationS / e.rate - e.durationS) > 1e-6) {
				add('duration', i, `Entry ${i + 1}: its length is not the track's length at its rate.`);
			}
		}
		if (!inLesson) {
			const prev = lastStart.get(e.danceId);
			if (prev !== undefined && e.startS - prev < s.repeatWindowMin * 60 - EPS) {
				add('repeat', i, `Entry ${i + 1} repeats a dance within ${s.repeatWindowMin} minutes.`);
			}
			lastStart.set(e.danceId, e.startS);
			adv = dance?.level === 'advanced' ? adv + 1 : 0;
			if (adv >= 3) add('advanced-run', i, `Three advanced dances in a row at entry ${i + 1}.`);
			// A rest or a break between them makes two partner dances two separate turns.
			if (partner && prevPartner && !s.partnerBackToBack && !e.locked)
				add('partner-twice', i, `Entry ${i + 1} is a second partner dance in a row.`);
		}
		// A lesson's practice counts too: a partner lesson is not followed by a partner dance.
		prevPartner = partner;
		if (e.trackId !== null) {
			if (seenTracks.has(e.trackId))
				add('track-twice', i, `Entry ${i + 1} plays a track a second time.`);
			seenTracks.add(e.trackId);
		}
	});
	sections.forEach((sec, si) => {
		const mine = entries.filter((e) => e.sectionId === sec.id);
		const secEnd = Math.min(sec.endS, eveningS);
		const next = si + 1 < sections.length ? sections[si + 1].startS : eveningS;
		if (secEnd - sec.startS <= s.endToleranceS && mine.length === 0) return;
		const end = mine.length ? Math.max(...mine.map((e) => e.startS + e.durationS)) : sec.startS;
		const latest = Math.max(Math.min(secEnd + s.endToleranceS, next, eveningS), secEnd);
		const locked = mine.some((e) => e.locked && e.startS + e.durationS >= end - EPS);
		if (!locked && (end > latest + EPS || end < secEnd - s.endToleranceS - EPS)) {
			add(
				'section-time',
				-1,
				`Section ${String(sec.id)} ends at ${end} s, not within ${s.endToleranceS} s of ${secEnd} s.`
			);
		}
		if (sec.kind !== 'lesson' || sec.danceId === undefined) return;
		const dance = dances.get(sec.danceId);
		const slow = mine.some((e) => {
			if (e.kind !== 'dance' || e.danceId !== sec.danceId) return false;
			const bpm = e.trackId === null ? null : tracks.get(e.trackId)?.bpm;
			return e.rate < 1 || (bpm != null && dance !== undefined && bpm * e.rate <= dance.bpmMin);
		});
		if (!mine.some((e) => e.kind === 'teach') && !mine.some((e) => e.locked)) {
			add('lesson', -1, `The lesson has no teach.`);
		}
		if (!slow) add('lesson', -1, `The lesson's dance is not played at lesson tempo in the lesson.`);
		const again = entries.some(
			(e) =>
				e.kind === 'dance' &&
				e.danceId === sec.danceId &&
				e.startS >= sec.endS - EPS &&
				Math.abs(e.rate - 1) <= s.fullTempoTolerance + EPS
		);
		if (!again) add('reprise', -1, `The lesson's dance is not danced again at full tempo.`);
	});
	for (const lock of input.locked ?? []) {
		const kept = entries.some(
			(e) =>
				e.locked &&
				Math.abs(e.startS - lock.startS) < EPS &&
				e.kind === lock.entry.kind &&
				(e.danceId ?? null) === (lock.entry.danceId ?? null) &&
				(e.trackId ?? null) === (lock.entry.trackId ?? null) &&
				Math.abs(e.durationS - lock.entry.durationS) < EPS
		);
		if (!kept)
			add(
				'lock',
				lock.position,
				`The locked entry at position ${lock.position + 1} moved or is missing.`
			);
	}
	return out;
}
