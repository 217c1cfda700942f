// Turns the final plan into the public entries, each with the reasons it was chosen, and lists the
// preferences the plan could not meet, in plain words.
import { LEVEL_LABELS, LEVELS, RHYTHM_LABELS, type Rhythm } from '../domain';
import { partnerSettingWords } from './formation';
import { place, type Placed } from './layout';
import type { Plan, Problem } from './model';
import { firstDanceStart, isAfterLesson, isEarly } from './costs';
import { restSettingWords } from './settings';
import { minutesWords } from './time';
import type { PlanEntry } from './types';

/** "east coast swing", as a reason's sentence writes it; an unknown rhythm as it came. */
const rhythmWords = (r: string) => (RHYTHM_LABELS[r as Rhythm] ?? r).toLowerCase();

const CROWD_WORDS = {
	'mostly-beginners': 'a crowd of mostly beginners',
	mixed: 'a mixed crowd',
	experienced: 'an experienced crowd'
} as const;

const fmt = (n: number) => (Math.round(n * 100) / 100).toString();

function danceReasons(problem: Problem, p: Placed, prev: Placed | null, ctx: Ctx): string[] {
	const s = problem.settings;
	const c = p.item.cand!;
	const d = problem.dances[c.dance];
	const level = LEVEL_LABELS[LEVELS[d.rank]].toLowerCase();
	const out: string[] = [];
	if (p.item.lesson) {
		out.push(
			c.rate < 1
				? `taught in the lesson at ${fmt(c.rate)}×`
				: `taught in the lesson: this track is already slow enough (${Math.round(c.eff)} BPM)`
		);
	}
	for (const l of problem.lessons) {
		if (
			!p.item.lesson &&
			l.dance === c.dance &&
			p.start >= l.endS &&
			Math.abs(c.rate - 1) <= s.fullTempoTolerance
		) {
			out.push(
				`the lesson's dance again at full tempo, ${minutesWords(p.start - l.endS)} after the lesson`
			);
		}
	}
	if (problem.requests.some((r) => r.dance === c.dance)) out.push('requested by dancers');
	if (problem.must.some((m) => m.dance === c.dance)) out.push('on the must-play list');
	if (problem.sections[p.slot.section]?.kind === 'last-dance' && ctx.lastIndex === ctx.index) {
		out.push(
			d.wellKnown && d.rank <= 1 ? 'last dance: well known and easy' : 'last dance of the evening'
		);
	}
	if (!p.item.lesson) {
		if (d.rank <= 1 && isEarly(ctx.firstDance, p.start))
			out.push(`${level} dance early in the evening`);
		else if (d.rank <= 1 && isAfterLesson(problem, p.start))
			out.push(`${level} dance right after the lesson`);
		else if (d.rank === 4) out.push('advanced dance, spaced from the other hard ones');
		else out.push(`${level} dance for ${CROWD_WORDS[problem.crowd]}`);
	}
	const rateWords = Math.abs(c.rate - 1) > 1e-9 ? ` at ${fmt(c.rate)}×` : '';
	out.push(
		c.marked
			? `the team marked this track as fitting${rateWords} (score ${fmt(c.score)})`
			: `fits this track${rateWords}: score ${fmt(c.score)}`
	);
	if (c.eff > 0) {
		const fast = c.eff >= s.fastBpm;
		const prevFast = prev?.item.cand && prev.item.cand.eff >= s.fastBpm;
		if (fast) out.push(`lively: ${Math.round(c.eff)} BPM`);
		else if (prevFast) out.push(`a calmer ${Math.round(c.eff)} BPM after a fast dance`);
	}
	const prevD =
		prev?.item.cand && prev.item.kind === 'dance' ? problem.dances[prev.item.cand.dance] : null;
	if (prevD && prevD.rhythm !== d.rhythm)
		out.push(`a change of rhythm: ${rhythmWords(d.rhythm)} after ${rhythmWords(prevD.rhythm)}`);
	if (d.partner && !p.item.lesson)
		out.push(
			s.partnerEvery > 0
				? `a partner dance, as ${partnerSettingWords(s)} asks`
				: 'a partner dance: find a partner'
		);
	return out;
}

interface Ctx {
	firstDance: number;
	index: number;
	lastIndex: number;
}

export function toEntries(problem: Problem, plan: Plan): PlanEntry[] {
	const placed = place(problem, plan);
	const firstDance = firstDanceStart(problem, plan);
	let lastIndex = -1;
	placed.forEach((p, i) => {
		if (p.item.kind === 'dance') lastIndex = i;
	});
	let dancing = 0;
	let lastEnd = 0;
	let prevDance: Placed | null = null;
	return placed.map((p, index): PlanEntry => {
		const { item, slot, start } = p;
		const s = problem.settings;
		if (start - lastEnd >= s.breakLengthMin * 60) dancing = 0;
		const section = problem.sections[slot.section];
		const lessonDance =
			section?.kind === 'lesson' && section.dance >= 0 ? problem.dances[section.dance] : null;
		const reasons: string[] = [];
		if (item.locked) reasons.push('locked by the team');
		if (item.kind === 'dance' && item.cand && item.cand.dance >= 0) {
			reasons.push(...danceReasons(problem, p, prevDance, { firstDance, index, lastIndex }));
		} else if (item.kind === 'teach') {
			reasons.push(
				lessonDance ? `teaching ${lessonDance.name} for ${minutesWords(item.dur)}` : 'teaching'
			);
		} else if (item.kind === 'walkthrough') {
			reasons.push(
				lessonDance
					? `walkthrough of ${lessonDance.name} before dancing it to music`
					: 'walkthrough'
			);
		} else if (item.kind === 'break') {
			reasons.push(
				item.inserted
					? `rest after ${minutesWords(dancing)} of dancing, as ${restSettingWords(s)} asks`
					: section?.kind === 'break'
						? 'the break in the evening’s sections'
						: 'break'
			);
			reasons.push('time to rest and drink water; follow the venue’s own rules');
		} else if (item.kind === 'announcement' && !item.locked) {
			reasons.push(
				`fills ${minutesWords(item.dur)} that no fitting music could: notices and changeover`
			);
		}
		if (item.kind === 'break') dancing = 0;
		else if (item.kind === 'dance' || item.kind === 'walkthrough') dancing += item.dur;
		lastEnd = start + item.dur;
		if (item.kind === 'dance') prevDance = p;
		else if (item.kind === 'break') prevDance = null;
		const c = item.cand;
		const lock = item.lock;
		return {
			position: index,
			kind: item.kind,
			// A teach or walkthrough names the lesson's dance, for the run sheet.
			danceId:
				c && c.dance >= 0
					? problem.dances[c.dance].id
					: lock
						? (lock.data.danceId ?? null)
						: (item.kind === 'teach' || item.kind === 'walkthrough') && lessonDance
							? lessonDance.id
							: null,
			trackId: c && c.track >= 0 ? problem.tracks[c.track].id : (lock?.data.trackId ?? null),
			startS: start,
			durationS: item.dur,
			rate: c ? c.rate : (lock?.data.rate ?? 1),
			locked: item.locked,
			sectionId: section?.id ?? lock?.data.sectionId ?? null,
			...(lock?.data.title ? { title: lock.data.title } : {}),
			reasons
		};
	});
}
